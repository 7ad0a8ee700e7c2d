import type { DeviceConfig } from '@/shared/domain/workshop';
import { deviceTransport, type DeviceTransport } from './transport';

/**
 * A simulated beacon: polls its configuration with ETags, reports heartbeats, "transmits" what the
 * plan says and logs it, lets its clock and temperature wander, and now and then goes silent.
 */
export type SimOptions = {
  baseUrl: string;
  token: string;
  name: string;
  /** heartbeats and polls come this many times as often as a real beacon's (every 60 s) */
  speed: number;
  /** chance per heartbeat of falling silent for a while */
  silenceChance: number;
  random?: () => number;
  log?: (line: string) => void;
};

export class SimulatedDevice {
  private etag: string | null = null;
  private config: DeviceConfig | null = null;
  private sent = new Set<string>();
  private clockOffsetMs: number;
  private temperatureC: number;
  private silentUntil = 0;
  private forcedSilent = false;
  private timer: NodeJS.Timeout | null = null;
  private readonly startedAt = Date.now();
  private readonly random: () => number;
  private readonly transport: DeviceTransport;
  stats = { polls: 0, notModified: 0, heartbeats: 0, transmissions: 0, errors: 0 };

  constructor(private readonly options: SimOptions) {
    this.random = options.random ?? Math.random;
    this.transport = deviceTransport({ baseUrl: options.baseUrl, token: options.token });
    this.clockOffsetMs = (this.random() - 0.5) * 200;
    this.temperatureC = 18 + this.random() * 6;
  }

  /** Switches the device off the air (no polls, no heartbeats) until resumed. */
  setSilent(silent: boolean) {
    this.forcedSilent = silent;
  }

  get silent() {
    return this.forcedSilent || Date.now() < this.silentUntil;
  }

  async tick() {
    if (this.silent) return;
    if (this.random() < this.options.silenceChance) {
      this.silentUntil = Date.now() + (2 + this.random() * 8) * (60_000 / this.options.speed);
      this.options.log?.(`${this.options.name}: goes silent for a while`);
      return;
    }
    try {
      await this.poll();
      await this.transmitDue();
      await this.heartbeat();
    } catch (error) {
      this.stats.errors += 1;
      this.options.log?.(`${this.options.name}: ${(error as Error).message}`);
    }
  }

  private async poll() {
    // gzip: about 2 KB instead of 27.
    const answer = await this.transport.config(this.etag);
    this.stats.polls += 1;
    if (answer.status === 304) {
      this.stats.notModified += 1;
      return;
    }
    if (answer.document === null) throw new Error(`config answered ${answer.status}`);
    this.etag = answer.etag;
    this.config = answer.document as DeviceConfig;
  }

  private async transmitDue() {
    if (!this.config || this.config.status !== 'transmit') return;
    const now = Date.now();
    const due = this.config.plan.transmissions.filter((t) => Date.parse(t.startUtc) <= now && !this.sent.has(t.startUtc));
    if (due.length === 0) return;
    for (const t of due) this.sent.add(t.startUtc);
    const status = await this.transport.transmissions({
      transmissions: due.map((t) => ({ startUtc: t.startUtc, bandId: t.bandId, frequencyHz: t.carrierHz, messageText: t.messageText })),
    });
    if (status >= 200 && status < 300) this.stats.transmissions += due.length;
  }

  private async heartbeat() {
    // A random walk for the clock, a slow swing and a little noise for the temperature.
    this.clockOffsetMs += (this.random() - 0.5) * 40;
    this.temperatureC += (this.random() - 0.5) * 0.6 + Math.sin((Date.now() - this.startedAt) / 600_000) * 0.1;
    const last = [...this.sent].sort().at(-1);
    const lastTx = last ? this.config?.plan.transmissions.find((t) => t.startUtc === last) : undefined;
    const status = await this.transport.heartbeat({
      uptimeS: Math.round((Date.now() - this.startedAt) / 1000),
      firmwareVersion: 'sim-1.0',
      timeSource: 'network',
      clockOffsetMs: Number(this.clockOffsetMs.toFixed(1)),
      temperatureC: Number(this.temperatureC.toFixed(2)),
      supplyV: Number((5 + (this.random() - 0.5) * 0.1).toFixed(2)),
      lastTransmission: lastTx ? { startUtc: lastTx.startUtc, bandId: lastTx.bandId } : null,
      errorCodes: [],
    });
    if (status === 202) this.stats.heartbeats += 1;
    else throw new Error(`heartbeat answered ${status}`);
  }

  start() {
    const intervalMs = Math.max(250, 60_000 / this.options.speed);
    void this.tick();
    this.timer = setInterval(() => void this.tick(), intervalMs);
  }

  stop() {
    if (this.timer) clearInterval(this.timer);
  }
}
