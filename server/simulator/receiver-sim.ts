/**
 * Simulated listening posts: they learn the simulated fleet's planned transmissions from the beacons' own
 * configuration (as the beacons do), decide who hears what by our propagation model, and post what they decoded
 * to /api/device/v1/receptions once each slot is over.
 */
import { locatorToLatLon, type LatLon } from '@/shared/domain/locator';
import { expectedHeardHz, SLOT_MS } from '@/shared/domain/reception';
import { modelledSnrDb } from '@/shared/domain/reception/propagation';
import { sendJson } from './receptions-transport';

export type FleetBeacon = { token: string; name: string };
export type SimPost = { token: string; name: string; callsign: string; locator: string; bands: string[] };

type PlannedTx = { startUtc: string; bandId: string; carrierHz: number; messageText: string };
type BeaconPlan = { callsign: string; locator: string; transmissions: PlannedTx[] };

const CONFIG_REFRESH_MS = 10 * 60_000;
/** How far back the posts catch up when they start, so results show at once. */
const CATCH_UP_MS = 30 * 60_000;

const place = (locator: string): LatLon | null => {
  const found = locatorToLatLon(locator);
  return found.ok ? { lat: found.lat, lon: found.lon } : null;
};

export class SimulatedReceivers {
  private plans: BeaconPlan[] = [];
  private plansAt = 0;
  private doneUpTo: number;
  private timer: NodeJS.Timeout | null = null;
  stats = { batches: 0, accepted: 0, duplicates: 0, rejected: 0, errors: 0 };

  constructor(
    private readonly options: {
      baseUrl: string;
      fleet: FleetBeacon[];
      posts: SimPost[];
      log?: (line: string) => void;
      random?: () => number;
      now?: () => number;
    },
  ) {
    this.doneUpTo = this.now() - CATCH_UP_MS;
  }

  private now() {
    return this.options.now?.() ?? Date.now();
  }

  private async refreshPlans() {
    if (this.now() - this.plansAt < CONFIG_REFRESH_MS && this.plans.length) return;
    const plans: BeaconPlan[] = [];
    for (const beacon of this.options.fleet) {
      const answer = await sendJson(`${this.options.baseUrl}/api/device/v1/config`, 'GET', beacon.token);
      if (answer.status !== 200) {
        this.options.log?.(`receivers: cannot read ${beacon.name}'s plan (${answer.status})`);
        continue;
      }
      const config = answer.body as { identity: { callsign: string; locator: string }; plan: { transmissions: PlannedTx[] } };
      plans.push({ callsign: config.identity.callsign, locator: config.identity.locator, transmissions: config.plan.transmissions });
    }
    this.plans = plans;
    this.plansAt = this.now();
  }

  /** Posts every decode of the slots that ended since the last call. */
  async tick() {
    const random = this.options.random ?? Math.random;
    try {
      await this.refreshPlans();
    } catch (error) {
      this.stats.errors += 1;
      this.options.log?.(`receivers: ${(error as Error).message}`);
      return;
    }
    const until = Math.floor(this.now() / SLOT_MS) * SLOT_MS; // slots that started before this one are over
    const from = this.doneUpTo;
    if (until <= from) return;
    for (const post of this.options.posts) {
      const rx = place(post.locator);
      if (!rx) continue;
      const reports = [];
      for (const beacon of this.plans) {
        const tx = place(beacon.locator);
        if (!tx || beacon.callsign === post.callsign) continue;
        const powerDbm = Number(/ (\d+)$/.exec(beacon.transmissions[0]?.messageText ?? '')?.[1] ?? 23);
        for (const t of beacon.transmissions) {
          const slotMs = Math.floor(Date.parse(t.startUtc) / SLOT_MS) * SLOT_MS;
          if (slotMs < from || slotMs >= until || !post.bands.includes(t.bandId)) continue;
          const snrDb = modelledSnrDb({ tx, rx, bandId: t.bandId, utcMs: slotMs, powerDbm, random });
          if (snrDb === null) continue;
          reports.push({
            slotUtc: new Date(slotMs).toISOString(),
            bandId: t.bandId,
            txCallsign: beacon.callsign,
            txLocator: beacon.locator,
            txPowerDbm: powerDbm,
            snrDb,
            frequencyHz: Math.round(expectedHeardHz(t.carrierHz) + (random() - 0.5) * 4),
            driftHz: 0,
          });
        }
      }
      for (let i = 0; i < reports.length; i += 500) {
        try {
          const answer = await sendJson(`${this.options.baseUrl}/api/device/v1/receptions`, 'POST', post.token, {
            reports: reports.slice(i, i + 500),
          });
          if (answer.status !== 202) throw new Error(`${answer.status} ${JSON.stringify(answer.body).slice(0, 200)}`);
          const result = answer.body as { accepted: number; duplicates: number; rejected: unknown[] };
          this.stats.batches += 1;
          this.stats.accepted += result.accepted;
          this.stats.duplicates += result.duplicates;
          this.stats.rejected += result.rejected.length;
        } catch (error) {
          this.stats.errors += 1;
          this.options.log?.(`${post.name}: ${(error as Error).message}`);
        }
      }
    }
    this.doneUpTo = until;
  }

  start(everyMs = 20_000) {
    void this.tick();
    this.timer = setInterval(() => void this.tick(), everyMs);
  }

  stop() {
    if (this.timer) clearInterval(this.timer);
  }
}
