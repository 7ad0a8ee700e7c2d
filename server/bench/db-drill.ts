/**
 * npm run drill:db — kills the database under load and restarts it, then restarts the server alone,
 * and prints what the requests got. Uses its own MariaDB (DRILL_DB_PORT, default 3390 + the offset of
 * FAINTLINE_DB_PORT from 3300) and server port (DRILL_PORT, default E2E_PORT + 300), never the ones `npm start` uses.
 */
import { runDbDrill, stopDb } from './db-fault-scenario';

const dbPort = Number(process.env.DRILL_DB_PORT ?? 3390 + (Number(process.env.FAINTLINE_DB_PORT ?? 3317) - 3300));
const serverPort = Number(process.env.DRILL_PORT ?? Number(process.env.E2E_PORT ?? 8099) + 300);

async function main() {
  try {
    const f = await runDbDrill({ dbPort, serverPort, log: (line) => console.log(`[drill] ${line}`) });
    console.log('\nDatabase killed (SIGKILL) under device, sign-in and read load, restarted after 4 s:');
    console.log('  requests answered during the outage, by status:');
    for (const [status, n] of Object.entries(f.requestsDuringOutage).sort()) console.log(`    ${status.padEnd(10)} ${n}`);
    console.log(`  slowest answer during the outage: ${f.slowestDuringOutageS.toFixed(2)} s`);
    console.log(`  seconds to the first 503 from /api/health: ${f.secondsTo503?.toFixed(2) ?? 'never'}`);
    console.log(`  seconds from the database being back to the first 200: ${f.secondsToRecovery?.toFixed(2) ?? 'never'}`);
    console.log(`  answers 500 (should be 0): ${f.answers500}; server process exited: ${f.serverExitedDuringOutage ? 'yes' : 'no'}`);
    console.log(`  acknowledged writes ${f.outage.acknowledged}, stored ${f.outage.stored}, missing ${f.outage.missing}`);
    console.log('Server process restarted alone (SIGTERM, new process) under the same load:');
    console.log(`  seconds without a server: ${f.restart.secondsDown?.toFixed(2)}; requests refused or cut: ${f.restart.refusedOrCut}`);
    console.log(`  acknowledged writes ${f.restart.acknowledged}, stored ${f.restart.stored}, missing ${f.restart.missing}`);
    const ok = f.answers500 === 0 && f.outage.missing === 0 && f.restart.missing === 0 && !f.serverExitedDuringOutage;
    console.log(ok ? '\nPASS' : '\nFAIL');
    process.exitCode = ok ? 0 : 1;
  } finally {
    stopDb(dbPort);
  }
}

void main();
