import type { SessionUser } from '@/shared/api/contracts';
import type { Station } from '@/shared/schemas';

/** The demo operator as the session answers for her (fictional person, Q-prefixed callsign). */
export const demoOperator: SessionUser = {
  id: 2,
  email: 'operator@faintline.example',
  displayName: 'Ilse Marrow',
  callsign: 'Q1IMW',
  clubs: [],
  adminOfClubIds: [],
};

/** Her attic beacon as the stations API answers for it: no unit, no bands; each test overrides what it needs. */
export const stationFixture = (overrides: Partial<Station> = {}): Station => ({
  id: 12,
  ownerId: 2,
  ownerName: 'Ilse Marrow',
  name: 'Attic beacon',
  callsign: 'Q1IMW',
  locator: 'IO91WM',
  notes: '',
  unitId: null,
  region: 'itu1',
  audioOffsetHz: 1500,
  transmitEnabled: false,
  referenceErrorPpm: null,
  suspension: null,
  bands: [],
  createdAt: '2026-11-28T09:12:00.000Z',
  updatedAt: '2026-12-01T18:42:00.000Z',
  ...overrides,
});
