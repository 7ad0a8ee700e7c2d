import { Cron } from 'croner';
import { createServer } from 'node:http';
import { createApp, createHttpHandler } from './app';
import { evaluateAlerts } from './features/devices/alerts.service';
import { watchImports } from './features/receptions/imports.service';
import { sendLater } from './mail/send-later';
import { loadConfig } from './config';
import { migrateToLatest } from './db/migrator';
import { demoSignIns, seedDemoIfEmpty } from './db/seed/demo';
import { createSequelize } from './db/sequelize';
import { followChangesAcrossProcesses } from './lib/change-feed-follower';
import { createLogger } from './lib/logger';
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp';
import { createMailer } from './mail/mailer';

/** config → fake mail → database (migrate, seed) → listen; drains on SIGINT/SIGTERM. */
async function main() {
  const config = loadConfig();
  const logger = createLogger(config.LOG_LEVEL);
  let fakeSmtp: FakeSmtp | undefined;
  if (config.FAKE_SMTP === '1') {
    fakeSmtp = await startFakeSmtp({ host: '127.0.0.1', port: config.SMTP_PORT, mailDir: config.MAIL_DIR });
  }
  const sequelize = createSequelize(config.DATABASE_URL);
  await sequelize.authenticate();
  await migrateToLatest(sequelize);
  const seeded = process.env.FAINTLINE_SEED_DEMO === '0' ? false : await seedDemoIfEmpty(sequelize, config.BCRYPT_COST);
  const mailer = createMailer(config);
  const app = createApp({ config, sequelize, mailer, logger, fakeSmtp });
  // Several processes share one database: each follows the others' station changes (device caches drop them).
  const changeFeed =
    config.CHANGE_FEED_POLL_MS > 0 ? followChangesAcrossProcesses({ sequelize, logger, pollMs: config.CHANGE_FEED_POLL_MS }) : null;
  // Imports left running by a stopped server process end as failed with what they stored.
  watchImports(sequelize, logger);

  const handler = createHttpHandler(app, logger);
  let stopping = false;
  // While stopping, every answer closes its connection, so keep-alive clients move to the next server.
  const server = createServer((req, res) => {
    if (stopping) res.setHeader('Connection', 'close');
    handler(req, res);
  });
  // A 200 MB report file is read as fast as it can be stored: allow its upload more than Node's 5 minutes.
  server.requestTimeout = 60 * 60_000;
  server.on('error', (error) => {
    logger.fatal({ err: error }, `cannot listen on ${config.HOST}:${config.PORT}`);
    process.exit(1);
  });
  server.listen(config.PORT, config.HOST, () => {
    const url = `http://${config.HOST}:${config.PORT}`;
    console.log(`\nFaintline is running at ${url}${seeded ? ' (demo data seeded)' : ''}`);
    console.log(`Demo sign-ins (password ${demoSignIns[0].password}):`);
    for (const d of demoSignIns) console.log(`  ${d.email.padEnd(28)} ${d.role === 'admin' ? 'club admin' : 'operator'}`);
    if (fakeSmtp) console.log(`Local test inbox: ${url}/dev/inbox  (fake SMTP on 127.0.0.1:${fakeSmtp.port})`);
    console.log('Press Ctrl-C to stop.\n');
  });

  // Alert rules run on a schedule; the job row lock keeps several server processes from doubling up.
  const alertJob = new Cron(
    config.ALERTS_CRON,
    { protect: true, catch: (error) => logger.error({ err: error }, 'alert evaluation failed') },
    async () => {
      const mails = await evaluateAlerts(sequelize);
      for (const mail of mails ?? []) sendLater(mailer, logger, mail);
    },
  );

  // Graceful: stop taking connections, let requests in flight finish (each answers only after its
  // write), drain the heartbeat group writer, then close the pool. Nothing acknowledged is lost.
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'stopping');
    alertJob.stop();
    await changeFeed?.stop();
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    const forced = setTimeout(() => server.closeAllConnections(), config.SHUTDOWN_GRACE_MS);
    await closed;
    clearTimeout(forced);
    await (app.locals.drainWrites as () => Promise<void>)();
    mailer.close();
    await fakeSmtp?.close();
    await sequelize.close();
    process.exit(0);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
}

process.on('unhandledRejection', (reason) => {
  console.error('Unhandled rejection:', reason);
  process.exit(1);
});

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
