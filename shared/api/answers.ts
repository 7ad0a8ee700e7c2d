/**
 * What each API route answers, one type per answer, imported by the server (which builds it) and
 * the client (which reads it). Entities that are also inputs live in shared/schemas and are
 * re-exported here, so this file is the one list of answers.
 */
import type { BandId } from '../domain/bands';
import type { FleetConflict, FleetProposal, PlanResult, ScheduleIssue } from '../domain/schedule';
import type { BandCalibrationFromReports } from '../domain/reception/calibration-from-reports';
import type { StabilityPoint, StabilityVerdict } from '../domain/reception/stability';
import type { DeviceConfig, StationConfig } from '../domain/workshop';
import type {
  AlertSettings,
  ClubDetail,
  Invitation,
  OffsetProposal,
  ReviewRow,
  Schedule,
  Station,
  StationHealth,
  Unit,
  UnitPhoto,
} from '../schemas';
import type { ClubMembership, Health, SessionUser } from './contracts';

export type {
  AlertSettings,
  ClubDetail,
  ClubMembership,
  DeviceConfig,
  Health,
  Invitation,
  OffsetProposal,
  ReviewRow,
  Schedule,
  SessionUser,
  Station,
  StationConfig,
  StationHealth,
  Unit,
  UnitPhoto,
};

/** POST /api/auth/password-reset and …/confirm: a sentence to show. */
export type MessageAnswer = { message: string };

/** POST /api/auth/sessions/end-others and POST /api/auth/password: how many other sessions ended. */
export type SessionsEndedAnswer = { ended: number };

/** GET /api/auth/email-change: the address waiting for its confirmation link to be opened, if any. */
export type PendingEmailChange = { newEmail: string; expiresAtUtc: string } | null;

/** What happens to one of the person's clubs when the account is deleted. */
export type ClubOnDeletion = {
  clubId: number;
  clubName: string;
  /** leave: the membership ends; delete-club: the person is its only member; hand-over: the only admin of a club with other members */
  outcome: 'leave' | 'delete-club' | 'hand-over';
};

/** GET /api/auth/account/deletion: what deleting the account would take with it. */
export type AccountDeletionPreview = {
  stations: number;
  deviceTokens: number;
  units: number;
  listeningPosts: number;
  clubs: ClubOnDeletion[];
  /** false while a club still needs another admin */
  allowed: boolean;
};

/** GET /api/audit and GET /api/clubs/:clubId/audit (newest first; CSV with ?format=csv). */
export type AuditEntry = {
  id: number;
  atUtc: string;
  actorName: string;
  ownerId: number | null;
  clubId: number | null;
  action: string;
  entityType: string;
  entityId: number | null;
  summary: string;
  before: unknown;
  after: unknown;
};

/** GET /api/notifications */
export type Notice = { id: number; kind: string; message: string; link: string | null; readAt: string | null; createdAt: string };

/** POST /api/invitations/accept */
export type AcceptedInvitation = { clubId: number };

/** POST /api/clubs/:clubId/stations/:stationId/suspension */
export type SuspensionAnswer = { suspended: true; reason: string };

/** GET /api/clubs/:clubId/conflicts: club stations that meet in the same slots over the next 24 hours. */
export type ConflictStation = { name: string; owner: string; callsign: string };
export type ClubConflict = FleetConflict & { aStation?: ConflictStation; bStation?: ConflictStation };
export type ConflictProposal = FleetProposal['proposals'][number] & {
  stationName: string;
  /** the station is the asking admin's own: they change it themselves, no proposal is sent */
  mine: boolean;
  /** names of the stations it meets as planned now */
  meets: string[];
};
export type ClubConflicts = {
  fromUtc: string;
  conflicts: ClubConflict[];
  proposals: ConflictProposal[];
  unresolved: FleetProposal['unresolved'];
};

/** GET /api/clubs/:clubId/occupancy: transmissions per band per UTC hour, and each band's duty. */
export type OccupancyCell = { bandId: string; hourIndex: number; hourUtc: string; transmissions: number };
export type BandDuty = { bandId: string; transmissions: number; minutesOnAir: number; dutyPercent: number };
export type ClubOccupancy = { fromUtc: string; hoursUtc: string[]; cells: OccupancyCell[]; bands: BandDuty[] };

/** POST /api/stations/:id/calibration/proposal: what one guided measurement suggests (nothing is saved). */
export type CalibrationProposal = {
  referenceErrorPpm: number;
  errorHz: number;
  offsets: { bandId: BandId; frequencyHz: number; calibrationOffsetHz: number }[];
};

/**
 * GET /api/stations/:id/calibration/from-reports: per band, the median heard error and the offset it proposes
 * (sign of calibrationOffsetHz: positive = radiates high). Only reports since the band's last calibration count.
 */
export type CalibrationFromReports = {
  fromUtc: string;
  toUtc: string;
  bands: (BandCalibrationFromReports & {
    /** the start of the reports used on this band: the period's start or the band's last calibration, whichever is later */
    sinceUtc: string;
    dialHz: number;
    /** tone 0 as planned (dial + the station's audio offset) */
    plannedCarrierHz: number;
  })[];
};

/** GET /api/stations/:id/stability?band=&from=&to=: heard error and drift per transmission beside the unit's temperature. */
export type StabilityAnswer = {
  bandId: BandId;
  fromUtc: string;
  toUtc: string;
  carrierHz: number;
  points: StabilityPoint[];
  verdict: StabilityVerdict;
  /** the station's unit and the coefficient it states now, so the estimate can be saved to it */
  unitId: number | null;
  unitTempCoPpmPerC: number | null;
};

/** GET /api/stations/:id/plan: the shared expansion plus the editor checks. */
export type StationPlan = PlanResult & {
  stationId: number;
  fromUtc: string;
  toUtc: string;
  suspended: boolean;
  issues: ScheduleIssue[];
};

/** POST /api/stations/:id/device-token: shown once, only its hash is kept. */
export type DeviceTokenAnswer = { token: string };

/** POST /api/device/v1/heartbeat (true) and …/transmissions (how many were stored). */
export type StoredAnswer = { stored: true | number };
