import { runDbDrill, stopDb, type DrillFigures } from '@/server/bench/db-fault-scenario';

// Its own MariaDB (data under .cache/) and server port, apart from the test database and `npm start`.
const offset = Number(process.env.FAINTLINE_DB_PORT ?? 3317) - 3300;
const dbPort = Number(process.env.DB_FAULT_PORT ?? 3440 + offset);
const serverPort = Number(process.env.DB_FAULT_SERVER_PORT ?? Number(process.env.E2E_PORT ?? 8099) + 301);

let figures: DrillFigures;
beforeAll(async () => {
  figures = await runDbDrill({ dbPort, serverPort });
}, 240_000);
afterAll(() => stopDb(dbPort));

describe('the database fails under load', () => {
  it('while MariaDB is killed, every request is answered within 5 s with 503 (or a 2xx from memory), never a 500, and the server stays up', () => {
    const statuses = Object.keys(figures.requestsDuringOutage);
    expect(statuses.filter((s) => !/^(2\d\d|503)$/.test(s))).toEqual([]);
    expect(figures.requestsDuringOutage['503']).toBeGreaterThan(0);
    expect(figures.slowestDuringOutageS).toBeLessThan(5);
    expect(figures.answers500).toBe(0);
    expect(figures.serverExitedDuringOutage).toBe(false);
  });

  it('the health check says 503 within 5 s of the kill and the server recovers within 5 s of the database coming back', () => {
    expect(figures.secondsTo503).not.toBeNull();
    expect(figures.secondsTo503!).toBeLessThan(5);
    expect(figures.secondsToRecovery).not.toBeNull();
    expect(figures.secondsToRecovery!).toBeLessThan(5);
  });

  it('every heartbeat and transmission that got a 2xx is in the database, across the outage and a server restart', () => {
    expect(figures.outage.acknowledged).toBeGreaterThan(0);
    expect(figures.outage.missing).toBe(0);
    expect(figures.restart.acknowledged).toBeGreaterThan(0);
    expect(figures.restart.missing).toBe(0);
  });
});
