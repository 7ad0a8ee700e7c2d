/**
 * The `faintline` command: a thin layer over shared/domain. JSON goes to
 * stdout, one line per result; refusals go to stderr with exit code 1.
 */
import { Command, InvalidArgumentError } from 'commander';
import {
  bandFor,
  bandsFor,
  chainOutput,
  commandForBand,
  dbmToMw,
  designLowPass,
  encodeMessage,
  FILTER_KINDS,
  latLonToLocator,
  LICENCE_REGIONS,
  locatorToLatLon,
  MAX_WSPR_POWER_DBM,
  MIN_WSPR_POWER_DBM,
  nearestWsprLevel,
  pathBetweenLocators,
  planMessages,
  planSynth,
  predictOffsets,
  toneFrequenciesHz,
  type FilterKind,
  type LicenceRegion,
  type Refusal,
} from '../../shared/domain';
import { amplifierSupply, designPad, estimateExposure, neededAttenuation } from '../../shared/domain/bench';
import { airtimeByDay, effectiveDuty, expandPlan, validateSchedule } from '../../shared/domain/schedule';
import type { StationSettings, UnitHardware } from '../../shared/domain/workshop';
import { FILTER_LOSS_DB, spuriousRequirement } from '../../shared/domain/workshop';
import { scheduleInput } from '../../shared/schemas/schedule';

export type CliIo = { out: (line: string) => void; err: (line: string) => void; setExitCode: (code: number) => void };

const defaultIo: CliIo = {
  out: (line) => process.stdout.write(line + '\n'),
  err: (line) => process.stderr.write(line + '\n'),
  setExitCode: (code) => {
    process.exitCode = code;
  },
};

function number(label: string) {
  return (value: string): number => {
    const n = Number(value);
    if (value.trim() === '' || !Number.isFinite(n)) throw new InvalidArgumentError(`${label} must be a number; got '${value}'.`);
    return n;
  };
}

function region(value: string): LicenceRegion {
  const r = value.toLowerCase();
  if (!(LICENCE_REGIONS as readonly string[]).includes(r)) {
    throw new InvalidArgumentError(`Region must be one of ${LICENCE_REGIONS.join(', ')}; got '${value}'.`);
  }
  return r as LicenceRegion;
}

/** Drops the `ok` flag and turns typed arrays into plain arrays for JSON. */
function plain<T extends { ok: true }>(result: T): Omit<T, 'ok'> {
  const { ok: _ok, ...rest } = result;
  return JSON.parse(JSON.stringify(rest, (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as unknown as ArrayLike<number>) : v)));
}

const collect = (value: string, previous: string[] = []): string[] => [...previous, value];

type PlanOptions = {
  callsign: string;
  locator: string;
  power: number;
  band: string[];
  slots: number;
  duty?: number;
  every?: number;
  from?: string;
  hours: number;
  startDate?: string;
  endDate?: string;
  offset: number;
  staggerStep: number;
  staggerSpan: number;
  cal?: string[];
  seed?: string;
  region: LicenceRegion;
  summary?: boolean;
};

export function buildProgram(io: CliIo = defaultIo): Command {
  const fail = (refusal: Refusal | string): void => {
    io.err(`faintline: ${typeof refusal === 'string' ? refusal : refusal.reason}`);
    io.setExitCode(1);
  };
  const emit = (value: unknown): void => io.out(JSON.stringify(value));

  const program = new Command('faintline')
    .description(
      'Faintline beacon computations: WSPR messages and symbols, locators, paths, tones, synthesizer plans, power, filters and band rotation plans.',
    )
    .showHelpAfterError()
    .configureOutput({ writeOut: (s) => io.out(s.trimEnd()), writeErr: (s) => io.err(s.trimEnd()) });

  program
    .command('encode')
    .description('Encode WSPR messages into 162 channel symbols (one JSON line per message).')
    .argument('<message...>', 'messages such as "K1ABC FN42 37", "PJ4/K1ABC 37", "<PJ4/K1ABC> FK52UD 37"; quote each one')
    .action((args: string[]) => {
      // unquoted words (encode K1ABC FN42 37) form one message
      const messages = args.some((a) => /\s/.test(a)) ? args : [args.join(' ')];
      for (const text of messages) {
        const r = encodeMessage(text);
        if (!r.ok) {
          fail(`'${text}': ${r.reason}`);
          continue;
        }
        if (r.power.rounded)
          io.err(`faintline: power ${r.power.requestedDbm} dBm is not a WSPR level; sending ${r.power.reportedDbm} dBm.`);
        emit({ message: r.message, type: r.type, symbols: Array.from(r.symbols), power: r.power });
      }
    });

  program
    .command('messages')
    .description('The WSPR messages a station sends in turn for its callsign, locator and power.')
    .requiredOption('--callsign <callsign>', 'your callsign, plain (K1ABC) or with one prefix or suffix (PJ4/K1ABC, K1ABC/P)')
    .requiredOption('--locator <locator>', '4- or 6-character Maidenhead locator')
    .requiredOption('--power <dBm>', 'transmit power in dBm, 0 to 60')
    .action((opts: { callsign: string; locator: string; power: string }) => {
      const r = planMessages({ callsign: opts.callsign, locator: opts.locator, powerDbm: opts.power });
      if (!r.ok) return fail(r);
      emit({ messages: r.texts, types: r.types, callsign: r.callsign, locator: r.locator, power: r.power });
    });

  program
    .command('locator')
    .description('Locator → centre latitude/longitude, or --lat/--lon → locator.')
    .argument('[locator]', 'Maidenhead locator of 2, 4, 6 or 8 characters')
    .option('--lat <degrees>', 'latitude, north positive (write --lat=-34.9 for south)', number('Latitude'))
    .option('--lon <degrees>', 'longitude, east positive (write --lon=-56.2 for west)', number('Longitude'))
    .option('--precision <characters>', '2, 4, 6 or 8', number('Precision'), 6)
    .action((locator: string | undefined, opts: { lat?: number; lon?: number; precision: number }) => {
      if (locator !== undefined) {
        const r = locatorToLatLon(locator);
        return r.ok ? emit({ locator: r.locator, lat: r.lat, lon: r.lon }) : fail(r);
      }
      if (opts.lat === undefined || opts.lon === undefined) return fail('Give a locator, or both --lat and --lon.');
      const r = latLonToLocator({ lat: opts.lat, lon: opts.lon }, opts.precision);
      return r.ok ? emit({ locator: r.locator }) : fail(r);
    });

  program
    .command('path')
    .description('Great-circle distance (km) and initial bearing (degrees true) between two locators, on WGS84.')
    .argument('<from>', 'locator of the transmitter')
    .argument('<to>', 'locator of the receiver')
    .action((from: string, to: string) => {
      const r = pathBetweenLocators(from, to);
      return r.ok ? emit({ distanceKm: r.distanceKm, bearingDeg: r.bearingDeg }) : fail(r);
    });

  program
    .command('tones')
    .description('The four tones on a band, corrected for calibration, and whether they sit inside the 200 Hz window.')
    .requiredOption(
      '--band <band>',
      `band: ${bandsFor('itu1')
        .map((b) => b.id)
        .join(', ')}`,
    )
    .option('--offset <Hz>', 'audio offset of tone 0 above the dial frequency', number('Offset'), 1500)
    .option('--ppm <ppm>', 'reference error in ppm (positive = runs fast)', number('ppm'), 0)
    .option('--band-offset <Hz>', 'extra measured offset on this band, in Hz', number('Band offset'), 0)
    .option('--region <region>', `licence region: ${LICENCE_REGIONS.join(', ')}`, region, 'itu1')
    .action((opts: { band: string; offset: number; ppm: number; bandOffset: number; region: LicenceRegion }) => {
      const b = bandFor(opts.band, opts.region);
      if (!b.ok) return fail(b);
      const cmd = commandForBand(b.band.dialHz, opts.offset, { referenceErrorPpm: opts.ppm, bandOffsetHz: opts.bandOffset });
      emit({ band: b.band.id, region: opts.region, ...cmd });
      if (!cmd.window.inside)
        io.err(
          `faintline: warning: a tone falls outside ${cmd.window.windowLowHz}–${cmd.window.windowHighHz} Hz; choose an offset between 1400 and 1595 Hz.`,
        );
    });

  program
    .command('calibrate')
    .description('From one measurement (commanded vs observed), the reference error and the predicted offset on every band.')
    .requiredOption('--commanded <Hz>', 'frequency the generator was told to make', number('Commanded frequency'))
    .requiredOption('--observed <Hz>', 'frequency actually measured', number('Observed frequency'))
    .option('--offset <Hz>', 'audio offset used on each band', number('Offset'), 1500)
    .option('--region <region>', `licence region: ${LICENCE_REGIONS.join(', ')}`, region, 'itu1')
    .action((opts: { commanded: number; observed: number; offset: number; region: LicenceRegion }) => {
      const bands = bandsFor(opts.region);
      const r = predictOffsets(
        { commandedHz: opts.commanded, observedHz: opts.observed },
        bands.map((b) => ({ id: b.id, frequencyHz: b.dialHz + opts.offset })),
      );
      return r.ok ? emit(plain(r)) : fail(r);
    });

  program
    .command('synth')
    .description('Divider settings and register bytes (Silicon Labs AN619 layout) for the four tones on a band, or for given frequencies.')
    .option('--band <band>', 'band whose four tones to plan')
    .option('--offset <Hz>', 'audio offset of tone 0', number('Offset'), 1500)
    .option('--frequency <Hz...>', 'plan these frequencies instead of a band')
    .option('--reference <Hz>', 'reference crystal or TCXO, usually 25000000 or 27000000', number('Reference'), 25e6)
    .option('--ppm <ppm>', 'reference error in ppm; the plan compensates for it', number('ppm'), 0)
    .option('--region <region>', `licence region: ${LICENCE_REGIONS.join(', ')}`, region, 'itu1')
    .action((opts: { band?: string; offset: number; frequency?: string[]; reference: number; ppm: number; region: LicenceRegion }) => {
      let targetsHz: number[];
      if (opts.frequency) {
        targetsHz = opts.frequency.map(Number);
        if (targetsHz.some((f) => !Number.isFinite(f))) return fail('Each --frequency must be a number of Hz.');
      } else if (opts.band) {
        const b = bandFor(opts.band, opts.region);
        if (!b.ok) return fail(b);
        targetsHz = toneFrequenciesHz(b.band.dialHz + opts.offset);
      } else {
        return fail('Give --band or --frequency.');
      }
      const r = planSynth({ referenceHz: opts.reference, referenceErrorPpm: opts.ppm, targetsHz });
      return r.ok ? emit(plain(r)) : fail(r);
    });

  program
    .command('power')
    .description('Output power of generator → attenuator → amplifier → filter, and the WSPR level to report (with the working).')
    .option('--generator <dBm>', 'generator output level', number('Generator level'))
    .option('--mw <mW>', 'a power in mW to convert instead of a chain', number('Power in mW'))
    .option('--attenuator <dB>', 'attenuator', number('Attenuator'), 0)
    .option('--gain <dB>', 'amplifier gain', number('Gain'))
    .option('--saturation <dBm>', "amplifier's saturated output", number('Saturation'))
    .option('--filter-loss <dB>', 'low-pass filter insertion loss', number('Filter loss'), 0)
    .action((opts: { generator?: number; mw?: number; attenuator: number; gain?: number; saturation?: number; filterLoss: number }) => {
      if (opts.mw !== undefined) {
        if (!(opts.mw > 0)) return fail('Power in mW must be positive.');
        const dbm = 10 * Math.log10(opts.mw);
        return emit({ powerMw: opts.mw, powerDbm: dbm, report: chainOutput({ generatorDbm: dbm }).report });
      }
      if (opts.generator === undefined) return fail('Give --generator DBM (or --mw MW).');
      const r = chainOutput({
        generatorDbm: opts.generator,
        attenuatorDb: opts.attenuator,
        amplifierGainDb: opts.gain,
        amplifierSaturationDbm: opts.saturation,
        filterLossDb: opts.filterLoss,
      });
      emit({ ...r, generatorMw: dbmToMw(opts.generator) });
    });

  program
    .command('filter')
    .description('Harmonics of the square-wave drive, the attenuation needed, and a low-pass filter design with toroid turns.')
    .option('--band <band>', 'band to filter for (the carrier is its dial frequency + --offset)')
    .option('--offset <Hz>', 'audio offset of the carrier above the dial', number('Offset'), 1500)
    .option('--frequency <Hz>', 'carrier frequency instead of a band', number('Frequency'))
    .option('--cutoff <Hz>', 'filter cutoff; default 1.15 × the carrier (common practice, no source)', number('Cutoff'))
    .option('--kind <kind>', `filter kind: ${FILTER_KINDS.join(', ')}`, 'chebyshev-0.5')
    .option('--order <n>', '3, 5 or 7', number('Order'), 5)
    .option('--core <core>', 'iron-powder toroid for the inductors, e.g. T-50-2', 'T-50-2')
    .option('--duty <fraction>', 'duty cycle of the drive, 0 to 1', number('Duty cycle'), 0.5)
    .option('--power <dBm>', 'output power; the ITU rule outside region 2 depends on it', number('Power'), 23)
    .option('--limit <dB>', "spurious limit below the carrier; default the region's rule (named in the output)", number('Limit'))
    .option('--region <region>', `licence region: ${LICENCE_REGIONS.join(', ')}`, region, 'itu1')
    .action(
      (opts: {
        band?: string;
        offset: number;
        frequency?: number;
        cutoff?: number;
        kind: string;
        order: number;
        core: string;
        duty: number;
        power: number;
        limit?: number;
        region: LicenceRegion;
      }) => {
        let carrierHz: number;
        if (opts.frequency !== undefined) carrierHz = opts.frequency;
        else if (opts.band) {
          const b = bandFor(opts.band, opts.region);
          if (!b.ok) return fail(b);
          carrierHz = commandForBand(b.band.dialHz, opts.offset, { referenceErrorPpm: 0 }).carrierHz;
        } else return fail('Give --band or --frequency.');
        if (!(carrierHz > 0)) return fail('The carrier frequency must be positive.');
        if (!(opts.duty > 0 && opts.duty < 1)) return fail('Duty cycle must be between 0 and 1.');
        const spurious = spuriousRequirement({
          region: opts.region,
          carrierHz,
          powerW: dbmToMw(opts.power) / 1000,
          dutyCycle: opts.duty,
          limitDb: opts.limit,
        });
        const harmonics = spurious.harmonics;
        const r = designLowPass({
          kind: opts.kind as FilterKind,
          order: opts.order,
          cutoffHz: opts.cutoff ?? carrierHz * 1.15,
          core: opts.core,
          atFrequenciesHz: harmonics.map((h) => h.frequencyHz),
        });
        if (!r.ok) return fail(r);
        const meets = harmonics.every((h, i) => r.design.attenuation[i].attenuationDb >= h.requiredAttenuationDb);
        emit({
          fundamentalHz: carrierHz,
          carrierHz,
          region: opts.region,
          limit: spurious.limit,
          harmonics,
          design: r.design,
          meetsLimit: meets,
        });
        if (!meets)
          io.err(
            'faintline: warning: this filter does not reach the required attenuation at every harmonic; raise the order or lower the cutoff.',
          );
      },
    );

  program
    .command('pad')
    .description(
      'A matched resistive attenuator: exact pi and T resistors, the nearest E24 parts and what they really give, and the heat in each. ' +
        'With --generator and --want-dbm (or --want-mw), first works out the attenuation the chain needs.',
    )
    .option('--attenuation-db <dB>', 'attenuation of the pad', number('Attenuation'))
    .option('--impedance-ohm <ohm>', 'line impedance', number('Impedance'), 50)
    .option('--power-w <W>', 'power going into the pad, for the heat in each resistor', number('Power'), 0.01)
    .option('--rating-w <W>', "each resistor's power rating", number('Rating'), 0.25)
    .option('--generator <dBm>', 'generator output level (to work out the attenuation)', number('Generator level'))
    .option('--gain <dB>', 'amplifier gain after the pad', number('Gain'))
    .option('--saturation <dBm>', "amplifier's saturated output", number('Saturation'))
    .option('--filter-loss <dB>', 'low-pass filter insertion loss', number('Filter loss'), 0)
    .option('--want-dbm <dBm>', 'wanted output in dBm', number('Wanted output'))
    .option('--want-mw <mW>', 'wanted output in mW', number('Wanted output'))
    .action(
      (opts: {
        attenuationDb?: number;
        impedanceOhm: number;
        powerW: number;
        ratingW: number;
        generator?: number;
        gain?: number;
        saturation?: number;
        filterLoss: number;
        wantDbm?: number;
        wantMw?: number;
      }) => {
        let attenuationDb = opts.attenuationDb;
        let needed: unknown = undefined;
        if (attenuationDb === undefined) {
          if (opts.generator === undefined || (opts.wantDbm === undefined && opts.wantMw === undefined))
            return fail('Give --attenuation-db, or --generator with --want-dbm or --want-mw.');
          const r = neededAttenuation({
            generatorDbm: opts.generator,
            amplifierGainDb: opts.gain,
            amplifierSaturationDbm: opts.saturation,
            filterLossDb: opts.filterLoss,
            wanted: opts.wantMw !== undefined ? { mw: opts.wantMw } : { dbm: opts.wantDbm! },
          });
          if (!r.ok) return fail(r);
          needed = plain(r);
          for (const note of r.notes) io.err(`faintline: ${note}`);
          if (r.neededDb <= 0) return emit({ needed });
          attenuationDb = r.neededDb;
        }
        const pad = designPad({ attenuationDb, impedanceOhm: opts.impedanceOhm, inputW: opts.powerW, ratingW: opts.ratingW });
        if (!pad.ok) return fail(pad);
        emit({ ...(needed ? { needed } : {}), ...plain(pad) });
        for (const caution of pad.cautions) io.err(`faintline: caution: ${caution}`);
      },
    );

  program
    .command('supply')
    .description("An amplifier's DC input power, the heat it must shed, and the heatsink and fuse it needs.")
    .requiredOption('--output-w <W>', 'RF output power', number('Output'))
    .requiredOption('--supply-v <V>', 'supply voltage', number('Supply voltage'))
    .option('--supply-a <A>', 'supply current while transmitting', number('Supply current'))
    .option('--efficiency <fraction>', 'efficiency instead of a measured current, 0 to 1', number('Efficiency'))
    .option('--drive-w <W>', 'RF drive into the amplifier', number('Drive'), 0)
    .action((opts: { outputW: number; supplyV: number; supplyA?: number; efficiency?: number; driveW: number }) => {
      const r = amplifierSupply({
        rfOutputW: opts.outputW,
        rfDriveW: opts.driveW,
        supplyV: opts.supplyV,
        supplyA: opts.supplyA,
        efficiency: opts.efficiency,
      });
      if (!r.ok) return fail(r);
      emit(plain(r));
      for (const caution of r.cautions) io.err(`faintline: caution: ${caution}`);
    });

  program
    .command('exposure')
    .description(
      'RF exposure estimate: EIRP and the distance beyond which the time-averaged power density is within the general-public limit ' +
        '(47 CFR 1.1310 Table 1; far-field S = EIRP·duty/(4πr²)). An estimate only: local rules decide.',
    )
    .requiredOption('--power-w <W>', 'transmitter output power', number('Power'))
    .requiredOption('--gain-dbi <dBi>', 'antenna gain over isotropic', number('Gain'))
    .requiredOption('--frequency-hz <Hz>', 'transmit frequency', number('Frequency'))
    .option('--duty <fraction>', 'share of time on the air, 0 to 1 (a WSPR beacon at one slot in five: 0.2)', number('Duty'), 1)
    .option('--loss-db <dB>', 'feed-line loss', number('Loss'), 0)
    .action((opts: { powerW: number; gainDbi: number; frequencyHz: number; duty: number; lossDb: number }) => {
      const r = estimateExposure({
        powerW: opts.powerW,
        gainDbi: opts.gainDbi,
        frequencyHz: opts.frequencyHz,
        duty: opts.duty,
        lossDb: opts.lossDb,
      });
      if (!r.ok) return fail(r);
      emit(plain(r));
      for (const caution of r.cautions) io.err(`faintline: caution: ${caution}`);
    });

  program
    .command('plan')
    .description(
      'Expand a band rotation into its transmissions: one JSON line per transmission (UTC start, band, dial, audio offset, carrier, message). ' +
        'Assumes a suitable low-pass filter is fitted for every band you name; check your licence for bands and power.',
    )
    .requiredOption('--callsign <callsign>', 'your callsign, plain (K1ABC) or with one prefix or suffix (PJ4/K1ABC)')
    .requiredOption('--locator <locator>', '4- or 6-character Maidenhead locator; 6 characters send Type 1 and Type 3 in turn')
    .requiredOption('--power <dBm>', 'reported power in dBm (0, 3, 7, 10, 13 … 60)', number('Power'))
    .requiredOption(
      '--band <band[@from-to]>',
      'a step of the rotation, in order; repeat for more. 40m@20-6 runs 40 m only from 20:00 to 06:00 UTC',
      collect,
    )
    .option('--slots <n>', 'transmissions in a row on each band before moving on (1–30; pairs round up)', number('Slots'), 1)
    .option('--duty <percent>', 'share of the slots to use, drawn afresh each UTC day (1–100; default 20)', number('Duty'))
    .option('--every <n>', 'use every nth slot instead of a share (2–30)', number('Every'))
    .option('--from <time>', 'start of the range, ISO 8601 UTC such as 2026-12-02T00:00Z (default: now)')
    .option('--hours <h>', 'length of the range in hours (at most 744, a month)', number('Hours'), 24)
    .option('--start-date <date>', 'first UTC day the schedule runs, YYYY-MM-DD (default: the day of --from)')
    .option('--end-date <date>', 'last UTC day the schedule runs, YYYY-MM-DD (default: open-ended)')
    .option('--offset <Hz>', 'audio offset of tone 0 above the dial (1400–1595)', number('Offset'), 1500)
    .option('--stagger-step <Hz>', 'move the audio offset by this much per transmission (0–20)', number('Stagger step'), 0)
    .option('--stagger-span <Hz>', 'range the stagger walks across, centred on --offset (0–100)', number('Stagger span'), 30)
    .option(
      '--cal <band=Hz>',
      "a band's measured generator error in Hz (positive = radiates high), e.g. 20m=+4.5; repeat per band",
      collect,
    )
    .option('--seed <text>', 'what the daily share draw is seeded with (default: the callsign)')
    .option('--region <region>', `licence region: ${LICENCE_REGIONS.join(', ')}`, region, 'itu1')
    .option('--summary', 'end with one line of minutes on the air per band and UTC day, and the duty reached')
    .addHelpText(
      'after',
      '\nExamples:\n' +
        '  faintline plan --callsign K1ABC --locator FN42 --power 23 --band 20m --from 2026-12-02T00:00Z\n' +
        '  faintline plan --callsign K1ABC --locator FN42ab --power 23 --band 20m@7-19 --band 40m@19-7 --every 5 --stagger-step 3\n' +
        'Every transmission starts 1 s after an even UTC minute. Warnings go to stderr; a schedule with a blocking problem exits 1.',
    )
    .action((opts: PlanOptions) => {
      const fromMs = opts.from === undefined ? Date.now() : Date.parse(opts.from);
      if (!Number.isFinite(fromMs)) return fail(`--from must be an ISO 8601 time such as 2026-12-02T00:00Z; got '${opts.from}'.`);
      if (!(opts.hours > 0 && opts.hours <= 744)) return fail('--hours must be more than 0 and at most 744 (a month).');
      if (opts.duty !== undefined && opts.every !== undefined) return fail('Give --duty or --every, not both.');
      if (!(opts.power >= MIN_WSPR_POWER_DBM && opts.power <= MAX_WSPR_POWER_DBM))
        return fail(`--power ${opts.power} dBm is outside what WSPR can report: give 0 to 60 dBm (0, 3, 7, 10, 13 … 60).`);
      const reported = nearestWsprLevel(opts.power);
      if (reported.rounded)
        io.err(`faintline: power ${opts.power} dBm is not a WSPR level; the messages report ${reported.reportedDbm} dBm.`);
      const steps: { bandId: string; slots: number; activeHoursUtc: { fromHour: number; toHour: number } | null }[] = [];
      for (const text of opts.band) {
        const m = /^([^@]+)(?:@(\d{1,2})-(\d{1,2}))?$/.exec(text.trim());
        if (!m) return fail(`--band '${text}' is not a band or band@from-to (such as 40m@20-6).`);
        const b = bandFor(m[1], opts.region);
        if (!b.ok) return fail(b);
        steps.push({
          bandId: b.band.id,
          slots: opts.slots,
          activeHoursUtc: m[2] === undefined ? null : { fromHour: Number(m[2]), toHour: Number(m[3]) },
        });
      }
      const calibration = new Map<string, number>();
      for (const text of opts.cal ?? []) {
        const m = /^([^=]+)=([-+]?\d+(?:\.\d+)?)$/.exec(text.trim());
        const b = m && bandFor(m[1], opts.region);
        if (!m || !b || !b.ok) return fail(`--cal '${text}' must be band=Hz, such as 20m=+4.5.`);
        calibration.set(b.band.id, Number(m[2]));
      }
      const parsed = scheduleInput.safeParse({
        steps,
        cadence: opts.every !== undefined ? { kind: 'every-nth', nth: opts.every } : { kind: 'duty', dutyPercent: opts.duty ?? 20 },
        stagger: { stepHz: opts.staggerStep, spanHz: opts.staggerStep > 0 ? opts.staggerSpan : 0 },
        startDate: opts.startDate ?? new Date(fromMs).toISOString().slice(0, 10),
        endDate: opts.endDate ?? null,
      });
      if (!parsed.success) {
        const flag = (path: PropertyKey[]): string =>
          path[0] === 'steps' && typeof path[1] === 'number'
            ? `--band ${opts.band[path[1]]}`
            : path[0] === 'cadence'
              ? opts.every !== undefined
                ? '--every'
                : '--duty'
              : path[0] === 'stagger'
                ? path[1] === 'spanHz'
                  ? '--stagger-span'
                  : '--stagger-step'
                : path[0] === 'startDate'
                  ? '--start-date'
                  : path[0] === 'endDate'
                    ? '--end-date'
                    : 'schedule';
        for (const issue of parsed.error.issues) fail(`${flag(issue.path)}: ${issue.message}`);
        return;
      }
      const bandIds = [...new Set(parsed.data.steps.map((s) => s.bandId))];
      const station: StationSettings = {
        callsign: opts.callsign,
        locator: opts.locator,
        region: opts.region,
        audioOffsetHz: opts.offset,
        bands: bandIds.map((bandId) => ({ bandId, enabled: true, calibrationOffsetHz: calibration.get(bandId) ?? 0 })),
      };
      // a unit that reports exactly --power, with a filter assumed fitted for each band named
      const unit: UnitHardware = {
        generatorKind: 'pll',
        referenceHz: 25e6,
        tolerancePpm: 0,
        tempCoPpmPerC: null,
        disciplined: true,
        generatorLevelDbm: reported.reportedDbm + FILTER_LOSS_DB,
        attenuatorDb: 0,
        amplifier: null,
        filters: bandIds.flatMap((bandId) => {
          const b = bandFor(bandId, opts.region);
          return b.ok ? [{ bands: [bandId], type: 'assumed', order: 5, cutoffHz: b.band.windowHighHz * 1.1 }] : [];
        }),
        dutyCycle: 0.5,
      };
      const rules = { ...parsed.data, stationId: opts.seed ?? opts.callsign.trim().toUpperCase() };
      const issues = validateSchedule({ schedule: rules, station, unit });
      for (const issue of issues) {
        const where = issue.stepIndex === undefined ? '' : ` (--band ${opts.band[issue.stepIndex]})`;
        if (issue.level === 'warn') io.err(`faintline: warning${where}: ${issue.message}`);
      }
      const blocks = issues.filter((i) => i.level === 'block');
      if (blocks.length) {
        for (const issue of blocks)
          fail(`${issue.stepIndex === undefined ? '' : `--band ${opts.band[issue.stepIndex]}: `}${issue.message}`);
        return;
      }
      const result = expandPlan({ schedule: rules, station, unit, fromMs, toMs: fromMs + opts.hours * 3_600_000 });
      for (const q of result.quiet) io.err(`faintline: ${q.message}`);
      for (const t of result.transmissions) {
        const { stepIndex: _step, ...line } = t;
        emit(line);
      }
      if (opts.summary)
        emit({
          summary: { airtime: airtimeByDay(result.transmissions), duty: effectiveDuty(result), transmissions: result.transmissions.length },
        });
    });

  return program;
}

export async function runCli(argv: string[], io: CliIo = defaultIo): Promise<void> {
  const program = buildProgram(io);
  program.exitOverride();
  try {
    await program.parseAsync(argv);
  } catch (error) {
    const code = (error as { exitCode?: number }).exitCode;
    // --help and --version end through here with exit code 0
    io.setExitCode(typeof code === 'number' ? code : 1);
  }
}
