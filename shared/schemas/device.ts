import { labelText, utcTimestampField } from './fields';
import { TIME_SOURCES, bandIdField } from './unit';
import { z } from './zod-setup';

const isoUtc = utcTimestampField;

export const heartbeatInput = z.object({
  uptimeS: z.number().int('uptimeS is whole seconds').min(0, 'uptimeS cannot be negative'),
  firmwareVersion: labelText(40).min(1, 'Give the firmware version'),
  timeSource: z.enum(TIME_SOURCES, { message: 'timeSource is network, gps or rtc' }),
  clockOffsetMs: z
    .number()
    .min(-600_000, 'clockOffsetMs beyond ±10 minutes: fix the clock first')
    .max(600_000, 'clockOffsetMs beyond ±10 minutes: fix the clock first'),
  temperatureC: z.number().min(-60).max(125).nullable().optional().default(null),
  supplyV: z.number().min(0).max(60).nullable().optional().default(null),
  lastTransmission: z
    .object({ startUtc: isoUtc('lastTransmission.startUtc'), bandId: bandIdField })
    .nullable()
    .optional()
    .default(null),
  errorCodes: z.array(labelText(16).min(1)).max(20).optional().default([]),
});
export type HeartbeatInput = z.input<typeof heartbeatInput>;

export const transmissionLogInput = z.object({
  transmissions: z
    .array(
      z.object({
        startUtc: isoUtc('startUtc'),
        bandId: bandIdField,
        frequencyHz: z.number().positive('frequencyHz must be above 0'),
        messageText: labelText(40).min(3),
      }),
    )
    .min(1, 'Send at least one transmission')
    .max(50, 'Send at most 50 transmissions at a time'),
});

export const alertSettingsInput = z.object({
  silentMinutes: z.number().int().min(1, 'Allow at least 1 minute of silence').max(1440, 'At most a day (1440 minutes)'),
  clockOffsetMs: z.number().int().min(100, 'At least 100 ms').max(10_000, 'At most 10 000 ms'),
});
export type AlertSettings = z.infer<typeof alertSettingsInput>;

export type AlertRule =
  'silent' | 'clock-offset' | 'drift-out-of-window' | 'transmitting-while-suspended' | 'unheard-while-transmitting' | 'heard-off-frequency';
export type Alert = {
  id: number;
  stationId: number;
  rule: AlertRule;
  message: string;
  openedAt: string;
  lastSeenAt: string;
  resolvedAt: string | null;
};

export type StationHealth = {
  stationId: number;
  stationName: string;
  callsign: string;
  hasDevice: boolean;
  online: boolean;
  lastHeartbeatAt: string | null;
  heartbeatAgeS: number | null;
  clockOffsetMs: number | null;
  temperatureC: number | null;
  supplyV: number | null;
  firmwareVersion: string | null;
  /** worst-band frequency change the temperature implies, from the unit's coefficient (vs 20 °C) */
  driftHz: number | null;
  series: { at: string; clockOffsetMs: number | null; temperatureC: number | null }[];
  recent: { startUtc: string; bandId: string; planned: boolean }[];
  alerts: Alert[];
  settings: AlertSettings;
};
