/** Shapes that cross the HTTP boundary, shared by the server, the client and the CLI. */

export type ApiErrorCode =
  | 'bad-request'
  | 'unauthenticated'
  | 'forbidden'
  | 'not-found'
  | 'conflict'
  | 'payload-too-large'
  | 'unsupported-media-type'
  | 'rate-limited'
  | 'unavailable'
  | 'internal';

export type ApiErrorBody = {
  error: { code: ApiErrorCode; message: string; fields?: Record<string, string> };
};

export type ClubMembership = { clubId: number; clubName: string; role: 'member' | 'admin' };

export type SessionUser = {
  id: number;
  email: string;
  displayName: string;
  callsign: string | null;
  clubs: ClubMembership[];
  adminOfClubIds: number[];
};

export type Health = { status: 'ok' | 'degraded'; db: 'up' | 'down' };
