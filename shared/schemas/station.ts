import { z } from './zod-setup';
import { callsignField, locatorField } from './fields';

export const stationInput = z.object({
  name: z.string().trim().min(1, 'Give the station a name').max(80, 'Use at most 80 characters'),
  callsign: callsignField,
  locator: locatorField,
  notes: z.string().trim().max(2000, 'Use at most 2000 characters').optional().default(''),
});
export type StationInput = z.input<typeof stationInput>;

export const stationPatch = stationInput.partial();
export type StationPatch = z.input<typeof stationPatch>;

export type Station = {
  id: number;
  ownerId: number;
  ownerName: string;
  name: string;
  callsign: string;
  locator: string;
  notes: string;
  createdAt: string;
  updatedAt: string;
};
