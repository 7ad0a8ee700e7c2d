/** Who may read whose reception data: owners, and the admins of clubs the owner belongs to. */
import { QueryTypes, type Sequelize } from 'sequelize';

/** The members of the clubs someone administers (the admin included). */
export async function membersOfClubs(sequelize: Sequelize, clubIds: number[]): Promise<number[]> {
  if (clubIds.length === 0) return [];
  const rows = await sequelize.query<{ userId: number }>('SELECT DISTINCT userId FROM club_memberships WHERE clubId IN (?)', {
    replacements: [clubIds],
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => r.userId);
}

/** True when `ownerId` belongs to one of the clubs in `adminOfClubIds`. */
export async function ownerInClubs(sequelize: Sequelize, adminOfClubIds: number[], ownerId: number): Promise<boolean> {
  if (adminOfClubIds.length === 0) return false;
  const rows = await sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM club_memberships WHERE userId = ? AND clubId IN (?)', {
    replacements: [ownerId, adminOfClubIds],
    type: QueryTypes.SELECT,
  });
  return Number(rows[0]?.n ?? 0) > 0;
}

/** A station's owner, or null when there is no such station. */
export async function stationOwner(sequelize: Sequelize, stationId: number) {
  const rows = await sequelize.query<{ ownerId: number; callsign: string; locator: string; name: string }>(
    'SELECT ownerId, callsign, locator, name FROM stations WHERE id = ?',
    { replacements: [stationId], type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}

/** The ids of a person's stations. */
export async function stationIdsOf(sequelize: Sequelize, ownerId: number): Promise<number[]> {
  const rows = await sequelize.query<{ id: number }>('SELECT id FROM stations WHERE ownerId = ? ORDER BY name, id', {
    replacements: [ownerId],
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => r.id);
}
