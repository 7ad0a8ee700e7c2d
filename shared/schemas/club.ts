import { emailField, nameText, noteText } from './fields';
import { z } from './zod-setup';

export const clubInput = z.object({
  name: nameText(120).min(3, 'Give the club a name of at least 3 characters'),
  maxPowerDbm: z
    .number()
    .int('Give the limit in whole dBm')
    .min(0, 'The power limit is at least 0 dBm')
    .max(60, 'The power limit is at most 60 dBm (1 kW)')
    .optional()
    .default(30),
});
export type ClubInput = z.input<typeof clubInput>;
export const clubPatch = z.object({ name: clubInput.shape.name, maxPowerDbm: z.number().int().min(0).max(60) }).partial();

export const invitationInput = z.object({ email: emailField });
export const acceptInvitationInput = z.object({ token: z.string().min(20, 'The invitation link is incomplete').max(200) });
export const memberRoleInput = z.object({ role: z.enum(['member', 'admin'], { message: 'The role is member or admin' }) });
export const suspensionInput = z.object({
  reason: noteText(300)
    .min(5, 'Say in a few words why the station is stopped (at least 5 characters)')
    .max(300, 'Use at most 300 characters'),
});
export const offsetProposalInput = z.object({
  stationId: z.number().int().positive(),
  proposedOffsetHz: z.number().min(1400, 'The audio offset must be 1400–1600 Hz').max(1600, 'The audio offset must be 1400–1600 Hz'),
  reason: noteText(300).optional().default('Separates this station from another club station in the same slots'),
});

export type ClubMember = {
  userId: number;
  displayName: string;
  callsign: string | null;
  email: string;
  role: 'member' | 'admin';
  joinedAt: string;
};
export type ClubDetail = { id: number; name: string; maxPowerDbm: number; myRole: 'member' | 'admin'; members: ClubMember[] };
export type Invitation = { id: number; email: string; expiresAt: string; acceptedAt: string | null; createdAt: string };
export type ReviewFinding = { code: string; bandId?: string; message: string };
export type ReviewRow = {
  stationId: number;
  stationName: string;
  callsign: string;
  locator: string;
  ownerId: number;
  ownerName: string;
  bands: string[];
  status: 'ok' | 'attention' | 'suspended' | 'off';
  transmitEnabled: boolean;
  suspension: { at: string; reason: string } | null;
  findings: ReviewFinding[];
};
export type OffsetProposal = {
  id: number;
  clubId: number;
  clubName: string;
  stationId: number;
  stationName: string;
  currentOffsetHz: number;
  proposedOffsetHz: number;
  reason: string;
  status: 'pending' | 'accepted' | 'declined' | 'withdrawn';
  createdAt: string;
  decidedAt: string | null;
};
