import type { ClubConflicts, ClubOccupancy } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { DAY_MS, fleetStationFromPlan, findFleetConflicts, proposeFleetOffsets } from '@/shared/domain/schedule';
import { complianceFindings } from '@/shared/domain/workshop';
import type { ReviewRow, Schedule, Station, Unit } from '@/shared/schemas';
import { planFor } from '../schedules/plan';
import { schedulesOf } from '../schedules/schedules.service';
import { stationsOfOwners } from '../stations/stations.service';
import { unitById } from '../units/units.service';
import { memberIdsOf, requireAdmin } from './access';

type Loaded = { station: Station; unit: Unit | null; schedule: Schedule | null };

/** Every member's station with its unit and schedule, read once. */
async function loadClubStations(clubId: number): Promise<Loaded[]> {
  const stations = await stationsOfOwners(await memberIdsOf(clubId));
  const schedules = await schedulesOf(stations.map((s) => s.id));
  const units = new Map<number, Unit | null>();
  for (const id of new Set(stations.map((s) => s.unitId).filter((id): id is number => id !== null))) units.set(id, await unitById(id));
  return stations.map((station) => ({
    station,
    unit: station.unitId === null ? null : (units.get(station.unitId) ?? null),
    schedule: schedules.get(station.id) ?? null,
  }));
}

export async function review(user: SessionUser, clubId: number): Promise<ReviewRow[]> {
  const { club } = await requireAdmin(user, clubId);
  return (await loadClubStations(clubId)).map(({ station, unit, schedule }) => {
    const findings = complianceFindings({ station, unit, schedule, maxPowerDbm: club.maxPowerDbm });
    const bands = [
      ...new Set([...station.bands.filter((b) => b.enabled).map((b) => b.bandId), ...(schedule?.steps.map((s) => s.bandId) ?? [])]),
    ];
    return {
      stationId: station.id,
      stationName: station.name,
      callsign: station.callsign,
      locator: station.locator,
      ownerId: station.ownerId,
      ownerName: station.ownerName,
      bands,
      status: station.suspension ? 'suspended' : findings.length ? 'attention' : station.transmitEnabled ? 'ok' : 'off',
      transmitEnabled: station.transmitEnabled,
      suspension: station.suspension && { at: station.suspension.at, reason: station.suspension.reason },
      findings,
    };
  });
}

/** The club's transmissions over the next 24 hours, from each station's own plan. */
async function clubPlans(clubId: number, fromMs: number) {
  const loaded = await loadClubStations(clubId);
  return loaded
    .filter((l): l is Loaded & { schedule: Schedule } => l.schedule !== null && l.station.transmitEnabled)
    .map((l) => ({ ...l, plan: planFor(l.station, l.unit, l.schedule, fromMs, fromMs + DAY_MS) }));
}

export async function conflicts(user: SessionUser, clubId: number, now = Date.now()): Promise<ClubConflicts> {
  await requireAdmin(user, clubId);
  const plans = await clubPlans(clubId, now);
  const fleet = plans.map((p) => fleetStationFromPlan(p.station.id, p.station.audioOffsetHz, p.plan.transmissions));
  const found = findFleetConflicts(fleet);
  const proposal = proposeFleetOffsets(fleet);
  const names = new Map(
    plans.map((p) => [p.station.id, { name: p.station.name, owner: p.station.ownerName, callsign: p.station.callsign }]),
  );
  return {
    fromUtc: new Date(now).toISOString(),
    conflicts: found.map((c) => ({ ...c, aStation: names.get(Number(c.a)), bStation: names.get(Number(c.b)) })),
    proposals: proposal.proposals
      .filter((p) => Math.abs(p.proposedOffsetHz - p.currentOffsetHz) > 1e-9)
      .map((p) => ({
        ...p,
        stationName: names.get(Number(p.stationId))?.name ?? '',
        mine: plans.some((plan) => plan.station.id === Number(p.stationId) && plan.station.ownerId === user.id),
        // the stations it meets now, by name, so the proposal says what it parts
        meets: [
          ...new Set(
            found
              .filter((c) => Number(c.a) === Number(p.stationId) || Number(c.b) === Number(p.stationId))
              .map((c) => names.get(Number(Number(c.a) === Number(p.stationId) ? c.b : c.a))?.name ?? ''),
          ),
        ].filter(Boolean),
      })),
    unresolved: proposal.unresolved,
  };
}

/** Transmissions per band per UTC hour over the next 24 hours, and each band's duty. */
export async function occupancy(user: SessionUser, clubId: number, now = Date.now()): Promise<ClubOccupancy> {
  await requireAdmin(user, clubId);
  const plans = await clubPlans(clubId, now);
  const startHourMs = Math.floor(now / 3_600_000) * 3_600_000;
  const cells = new Map<string, number>();
  const perBand = new Map<string, number>();
  for (const { plan } of plans) {
    for (const tx of plan.transmissions) {
      const hour = Math.floor((tx.startMs - startHourMs) / 3_600_000);
      const key = `${tx.bandId}|${hour}`;
      cells.set(key, (cells.get(key) ?? 0) + 1);
      perBand.set(tx.bandId, (perBand.get(tx.bandId) ?? 0) + 1);
    }
  }
  const hours = Array.from({ length: 25 }, (_, h) => new Date(startHourMs + h * 3_600_000).toISOString());
  return {
    fromUtc: new Date(now).toISOString(),
    hoursUtc: hours,
    cells: [...cells].map(([key, transmissions]) => {
      const [bandId, hour] = key.split('|');
      return { bandId, hourIndex: Number(hour), hourUtc: hours[Number(hour)], transmissions };
    }),
    // 720 slots a day; a band's duty is the share of slots in which some club station sends on it
    bands: [...perBand].map(([bandId, transmissions]) => ({
      bandId,
      transmissions,
      minutesOnAir: Number(((transmissions * 110.6) / 60).toFixed(1)),
      dutyPercent: Number(((transmissions / 720) * 100).toFixed(1)),
    })),
  };
}
