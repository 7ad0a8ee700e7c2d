import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import { ClubModel } from '../models/club.model';
import { MembershipModel } from '../models/membership.model';
import { StationModel } from '../models/station.model';
import { UserModel } from '../models/user.model';

/** The demo scenario: a fictional club and people. Q-prefixed callsigns are never issued to amateurs. */
export const DEMO_PASSWORD = 'faintline-demo';
export const DEMO_CLUB = 'Saltmarsh Beacon Circle';

const people = [
  { email: 'admin@faintline.example', displayName: 'Hanne Stoll', callsign: 'Q3HST', role: 'admin' as const },
  { email: 'operator@faintline.example', displayName: 'Ilse Marrow', callsign: 'Q1IMW', role: 'member' as const },
  { email: 'second@faintline.example', displayName: 'Tobin Reyle', callsign: 'Q2TRY', role: 'member' as const },
];

const stationsByEmail: Record<string, { name: string; callsign: string; locator: string; notes: string }[]> = {
  'admin@faintline.example': [
    { name: 'Clubhouse reference', callsign: 'Q3HST', locator: 'JO32', notes: 'Roof-mounted vertical at the club hut.' },
  ],
  'operator@faintline.example': [
    { name: 'Attic beacon', callsign: 'Q1IMW', locator: 'IO91WM', notes: 'End-fed wire under the roof tiles.' },
    { name: 'Garden mast', callsign: 'Q1IMW', locator: 'IO91', notes: '' },
  ],
  'second@faintline.example': [
    { name: 'Shed rig', callsign: 'Q2TRY', locator: 'JO22', notes: 'Dipole between the shed and the oak.' },
    { name: 'Hilltop portable', callsign: 'Q2TRY/P', locator: 'JO22NB', notes: 'Weekend field station on batteries.' },
  ],
};

export async function seedDemoIfEmpty(sequelize: Sequelize, bcryptCost: number): Promise<boolean> {
  if ((await UserModel.count()) > 0) return false;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptCost);
  await sequelize.transaction(async (transaction) => {
    const club = await ClubModel.create({ name: DEMO_CLUB }, { transaction });
    for (const person of people) {
      const user = await UserModel.create(
        { email: person.email, displayName: person.displayName, callsign: person.callsign, passwordHash },
        { transaction },
      );
      await MembershipModel.create({ clubId: club.id, userId: user.id, role: person.role }, { transaction });
      for (const station of stationsByEmail[person.email] ?? []) {
        await StationModel.create({ ...station, ownerId: user.id }, { transaction });
      }
    }
  });
  return true;
}

export const demoSignIns = people.map(({ email, role }) => ({ email, role, password: DEMO_PASSWORD }));
