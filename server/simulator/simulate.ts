/**
 * npm run simulate -- --devices N --speed X [--url http://127.0.0.1:8080] [--silence 0.02]
 * Runs N simulated beacons against a running Faintline server with the demo devices' tokens
 * (or tokens from --tokens a,b,c). Ctrl-C stops it and prints what each device did.
 * npm run simulate -- --pair: one new beacon pairs by code first (RFC 8628), then runs with its token.
 * npm run simulate -- --receivers N: N simulated listening posts hear the fleet and post their decodes.
 */
import { Command } from 'commander';
import { DEMO_DEVICES } from '../db/seed/demo-devices';
import { DEMO_SIM_POSTS } from '../db/seed/demo-receivers';
import { SimulatedDevice } from './device-sim';
import { firstConfiguration, pairDevice } from './pairing';
import { SimulatedReceivers } from './receiver-sim';

const program = new Command('simulate')
  .description('Simulated beacons against a running Faintline server')
  .option('--devices <n>', 'how many devices', '3')
  .option('--speed <x>', 'report x times as often as a real beacon (every 60 s)', '10')
  .option('--url <url>', 'the server', process.env.FAINTLINE_URL ?? 'http://127.0.0.1:8080')
  .option('--silence <p>', 'chance per report of falling silent for a while', '0.02')
  .option('--tokens <list>', 'comma-separated device tokens (default: the demo devices)')
  .option('--pair', 'one new device: show a pairing code, wait for the owner to approve it, then run with the token it receives')
  .option('--model <text>', 'the model a pairing device reports', 'Faintline simulated beacon')
  .option('--firmware <text>', 'the firmware version a pairing device reports', 'sim-1.0')
  .option('--receivers <n>', `simulated listening posts that hear the fleet (0–${DEMO_SIM_POSTS.length})`, '0')
  .parse();

const opts = program.opts<{
  devices: string;
  speed: string;
  url: string;
  silence: string;
  tokens?: string;
  pair?: boolean;
  model: string;
  firmware: string;
  receivers: string;
}>();

async function pairedToken() {
  const log = (line: string) => console.log(line);
  const result = await pairDevice({ baseUrl: opts.url, model: opts.model, firmware: opts.firmware, log });
  if (!result.ok) {
    console.error(result.reason);
    process.exit(1);
  }
  console.log(`Paired: received a device token (${result.token.slice(0, 8)}…)`);
  const first = await firstConfiguration(opts.url, result.token);
  (first.ok ? console.log : console.error)(first.line);
  return [{ name: 'paired device', token: result.token }];
}

const listed = opts.tokens
  ? opts.tokens.split(',').map((t, i) => ({ name: `device ${i + 1}`, token: t.trim() }))
  : DEMO_DEVICES.map((d) => ({ name: d.stationName, token: d.token }));
void (opts.pair ? pairedToken() : Promise.resolve(listed)).then(run, (error: Error) => {
  console.error(`Pairing failed: ${error.message}`);
  process.exit(1);
});

function run(tokens: { name: string; token: string }[]) {
  const count = Math.min(Number(opts.devices), tokens.length);
  if (!(count > 0) || !(Number(opts.speed) > 0)) {
    console.error('Give --devices as a positive number and --speed above 0.');
    process.exit(2);
  }
  if (!opts.pair && Number(opts.devices) > tokens.length)
    console.error(`Only ${tokens.length} device tokens are known; simulating ${count}. Pass more with --tokens.`);

  const devices = tokens.slice(0, count).map(
    (t) =>
      new SimulatedDevice({
        baseUrl: opts.url,
        token: t.token,
        name: t.name,
        speed: Number(opts.speed),
        silenceChance: Number(opts.silence),
        log: (line) => console.log(line),
      }),
  );
  console.log(
    `Simulating ${count} device(s) against ${opts.url}, reporting every ${(60 / Number(opts.speed)).toFixed(1)} s. Ctrl-C stops.`,
  );
  for (const device of devices) device.start();
  const receiverCount = Math.max(0, Math.min(Number(opts.receivers) || 0, DEMO_SIM_POSTS.length));
  const receivers =
    receiverCount > 0
      ? new SimulatedReceivers({
          baseUrl: opts.url,
          fleet: tokens.slice(0, count),
          posts: DEMO_SIM_POSTS.slice(0, receiverCount),
          log: (line) => console.log(line),
        })
      : null;
  if (receivers) {
    console.log(`and ${receiverCount} listening post(s) hearing them, posting each slot's decodes once it is over.`);
    receivers.start();
  }

  const summary = setInterval(() => {
    const total = devices.reduce(
      (sum, d) => ({
        polls: sum.polls + d.stats.polls,
        heartbeats: sum.heartbeats + d.stats.heartbeats,
        transmissions: sum.transmissions + d.stats.transmissions,
        errors: sum.errors + d.stats.errors,
      }),
      { polls: 0, heartbeats: 0, transmissions: 0, errors: 0 },
    );
    console.log(
      `${new Date().toISOString().slice(11, 19)} UTC  polls ${total.polls}  heartbeats ${total.heartbeats}  transmissions ${total.transmissions}  errors ${total.errors}  silent ${devices.filter((d) => d.silent).length}` +
        (receivers
          ? `  reports accepted ${receivers.stats.accepted} (repeats ${receivers.stats.duplicates}, errors ${receivers.stats.errors})`
          : ''),
    );
  }, 15_000);

  function stop() {
    clearInterval(summary);
    for (const device of devices) device.stop();
    receivers?.stop();
    process.exit(0);
  }
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
