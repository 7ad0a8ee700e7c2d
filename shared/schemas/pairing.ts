import { z } from './zod-setup';

/**
 * Pairing a device without typing its token (the OAuth 2.0 device authorization grant, RFC 8628).
 * User codes use the 20 consonants RFC 8628 §6.1 suggests: no vowels (no words), no look-alikes.
 */
export const USER_CODE_ALPHABET = 'BCDFGHJKLMNPQRSTVWXZ';
export const USER_CODE_LENGTH = 8;

/** What a device may become once paired; listening posts join this list later. */
export const PAIRING_TARGET_KINDS = ['station'] as const;
export type PairingTargetKind = (typeof PAIRING_TARGET_KINDS)[number];

/** `bcdf-ghjk`, ` BCDF GHJK ` and `BCDFGHJK` are all the same code. */
export function normalizeUserCode(raw: string): string {
  return raw.toUpperCase().replace(/[^A-Z0-9]/g, '');
}

/** `BCDFGHJK` → `BCDF-GHJK`, as devices show it. */
export function formatUserCode(code: string): string {
  const plain = normalizeUserCode(code);
  return `${plain.slice(0, 4)}-${plain.slice(4)}`;
}

export function isUserCode(raw: string): boolean {
  const plain = normalizeUserCode(raw);
  return plain.length === USER_CODE_LENGTH && [...plain].every((c) => USER_CODE_ALPHABET.includes(c));
}

const USER_CODE_HINT = 'A pairing code has 8 letters, like BCDF-GHJK (no vowels, no digits)';

/** The code as the owner types it: case, spaces and dashes do not matter. */
export const userCodeField = z.string().trim().min(1, 'Type the code the device shows').refine(isUserCode, USER_CODE_HINT);
export const pairCodeForm = z.object({ code: userCodeField });
export type PairCodeForm = z.infer<typeof pairCodeForm>;

/** The device's own request (RFC 8628 §3.1); every field is optional. */
export const pairingRequestInput = z.object({
  client_id: z.string().trim().max(100).optional(),
  /** the kind of thing the device is; `station` (a beacon) when absent */
  scope: z.string().trim().max(40).optional(),
  model: z.string().trim().max(60, 'model: at most 60 characters').optional(),
  firmware: z.string().trim().max(40, 'firmware: at most 40 characters').optional(),
});
export type PairingRequestInput = z.infer<typeof pairingRequestInput>;

export const pairingApproveInput = z.object({
  targetId: z.number({ message: 'Choose which station the device will be' }).int().positive('Choose which station the device will be'),
});
export type PairingApproveInput = z.infer<typeof pairingApproveInput>;

/** One of the owner's stations (later also listening posts) the device may become. */
export type PairingTarget = { kind: PairingTargetKind; id: number; name: string; callsign: string; hasToken: boolean };

/** A device waiting for its owner, as the pairing screen shows it. */
export type PairingRequestView = {
  userCode: string;
  targetKind: PairingTargetKind;
  model: string | null;
  firmware: string | null;
  requestedAtUtc: string;
  expiresAtUtc: string;
  targets: PairingTarget[];
};

export type PairingDecision = { status: 'approved'; target: PairingTarget } | { status: 'refused' };
