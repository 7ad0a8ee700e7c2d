/**
 * Write conflicts: the app's transaction runner runs a transaction again, whole, when MariaDB answers with a
 * deadlock (how Galera also reports a failed certification) or a lock wait timeout. The deadlock here is a real
 * one, made on the single test MariaDB with two connections that take two row locks in opposite order.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { QueryTypes, Sequelize, type Transaction } from 'sequelize';
import { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import { migrateToLatest } from '@/server/db/migrator';
import { createSequelize } from '@/server/db/sequelize';
import { CONFLICT_ATTEMPTS, isWriteConflict, retryOnConflict, type TransactionRunner } from '@/server/db/transaction';
import { createReportStore } from '@/server/features/devices/reports.service';
import { isDatabaseUnavailable } from '@/server/lib/db-errors';
import { TEST_DATABASE_URL } from './helpers/test-app';

const TABLE = 'test_conflict_probe';
let db: Sequelize;
let plain: Sequelize;

/** Resolves once `count` callers have arrived: both transactions hold their first lock before either goes on. */
function barrier(count: number) {
  let arrived = 0;
  let open!: () => void;
  const opened = new Promise<void>((resolve) => (open = resolve));
  return () => {
    arrived += 1;
    if (arrived >= count) open();
    return opened;
  };
}

const bump = (runner: Sequelize, id: number, transaction: Transaction) =>
  runner.query(`UPDATE ${TABLE} SET n = n + 1 WHERE id = ?`, { replacements: [id], transaction });

/** Two transactions that lock rows 1 and 2 in opposite order: InnoDB finds the deadlock and rolls one back. */
async function crossedTransactions(runner: Sequelize) {
  const bothLocked = barrier(2);
  let runs = 0;
  const crossed = (first: number, second: number) =>
    runner.transaction(async (transaction) => {
      runs += 1;
      await bump(runner, first, transaction);
      await bothLocked();
      await bump(runner, second, transaction);
    });
  const outcomes = await Promise.allSettled([crossed(1, 2), crossed(2, 1)]);
  return { outcomes, runs };
}

async function counts() {
  const rows = await db.query<{ id: number; n: number }>(`SELECT id, n FROM ${TABLE} ORDER BY id`, { type: QueryTypes.SELECT });
  return rows.map((r) => Number(r.n));
}

beforeAll(async () => {
  db = createSequelize(TEST_DATABASE_URL);
  plain = new Sequelize(TEST_DATABASE_URL, { dialect: 'mariadb', logging: false });
  await migrateToLatest(db);
  await db.query(`CREATE TABLE IF NOT EXISTS ${TABLE} (id INT NOT NULL PRIMARY KEY, n INT NOT NULL) ENGINE=InnoDB`);
});

beforeEach(async () => {
  await db.query(`DELETE FROM ${TABLE}`);
  await db.query(`INSERT INTO ${TABLE} (id, n) VALUES (1, 0), (2, 0)`);
});

afterAll(async () => {
  await db.query(`DROP TABLE IF EXISTS ${TABLE}`);
  await Promise.all([db.close(), plain.close()]);
});

describe('a real deadlock between two connections', () => {
  it('fails one of the two transactions with errno 1213 when nothing retries (the scenario is a real deadlock)', async () => {
    const { outcomes, runs } = await crossedTransactions(plain);
    const failed = outcomes.filter((o) => o.status === 'rejected');
    expect(runs).toBe(2);
    expect(failed).toHaveLength(1);
    expect(isWriteConflict(failed[0].reason)).toBe(true);
    // The survivor's two updates are stored, the victim's are rolled back.
    expect(await counts()).toEqual([1, 1]);
  });

  it("is resolved by the app's runner: the rolled-back transaction runs again and both commit", async () => {
    const { outcomes, runs } = await crossedTransactions(db);
    expect(outcomes.map((o) => o.status)).toEqual(['fulfilled', 'fulfilled']);
    expect(runs).toBe(3);
    expect(await counts()).toEqual([2, 2]);
  });
});

describe('a lock wait timeout', () => {
  it('runs the waiting transaction again once the lock is free', async () => {
    const holder = await plain.transaction();
    await bump(plain, 1, holder);
    let runs = 0;
    const waiting = db.transaction(async (transaction) => {
      runs += 1;
      // MariaDB's smallest wait is 1 s; the first run times out while the holder keeps its lock.
      await db.query('SET SESSION innodb_lock_wait_timeout = 1', { transaction });
      await bump(db, 1, transaction);
    });
    await new Promise((resolve) => setTimeout(resolve, 1800));
    await holder.commit();
    await waiting;
    expect(runs).toBeGreaterThanOrEqual(2);
    expect(await counts()).toEqual([2, 0]);
  });
});

describe('what is not retried', () => {
  it('runs a transaction that fails for another reason (a duplicate key) once', async () => {
    let runs = 0;
    await expect(
      db.transaction(async (transaction) => {
        runs += 1;
        await db.query(`INSERT INTO ${TABLE} (id, n) VALUES (1, 0)`, { transaction });
      }),
    ).rejects.toThrow();
    expect(runs).toBe(1);
  });

  it('gives up after a bounded number of runs and throws the conflict, which the API answers as 503', async () => {
    // errno 1213 / ER_LOCK_DEADLOCK as listed in MariaDB's error code table (MariaDB Knowledge Base, "MariaDB Error
    // Codes"; quoted from memory); the first test above gets the same errno from a real server.
    const conflict = Object.assign(new Error('Deadlock found when trying to get lock'), { errno: 1213, code: 'ER_LOCK_DEADLOCK' });
    let runs = 0;
    const waits: number[] = [];
    await expect(
      retryOnConflict(
        async () => {
          runs += 1;
          throw conflict;
        },
        { onRetry: (_e, n) => waits.push(n), random: () => 0 },
      ),
    ).rejects.toBe(conflict);
    expect(runs).toBe(CONFLICT_ATTEMPTS);
    expect(waits).toEqual([1, 2, 3, 4]);
    expect(isDatabaseUnavailable({ name: 'SequelizeDatabaseError', parent: conflict })).toBe(true);
  });

  it('does not retry a transaction nested in another (the outer one retries as a whole)', async () => {
    const conflict = Object.assign(new Error('Deadlock'), { errno: 1213 });
    let inner = 0;
    await expect(
      db.transaction(async (outer) =>
        db.transaction({ transaction: outer }, async () => {
          inner += 1;
          if (inner === 1) throw conflict;
        }),
      ),
    ).resolves.toBeUndefined();
    // The inner savepoint failed once without a retry of its own; the outer transaction ran it again.
    expect(inner).toBe(2);
  });
});

describe('device reports go through the transaction runner (so a conflict is retried)', () => {
  it('writes heartbeat groups and transmission logs inside runner transactions', async () => {
    let transactions = 0;
    const refused = new Error('refused by the test runner');
    const runner: TransactionRunner = {
      transaction: async () => {
        transactions += 1;
        throw refused;
      },
    };
    const store = createReportStore(runner);
    const beat = heartbeatInput.parse({ uptimeS: 1, firmwareVersion: 'test-1', timeSource: 'network', clockOffsetMs: 0 });
    const outcomes = await Promise.allSettled([store.heartbeat(1, beat), store.heartbeat(2, beat)]);
    expect(outcomes.map((o) => o.status)).toEqual(['rejected', 'rejected']);
    // One transaction for the group of two, then one for each row on its own (the group writer's fallback).
    expect(transactions).toBe(3);
    const { transmissions: sent } = transmissionLogInput.parse({
      transmissions: [{ startUtc: '2026-12-02T10:04:01Z', bandId: '20m', frequencyHz: 14_097_100, messageText: 'Q5DRL JO22 23' }],
    });
    await expect(store.transmissions(1, sent)).rejects.toBe(refused);
    expect(transactions).toBe(4);
  });
});

describe("the schema keeps Galera's rules", () => {
  it('gives every table a primary key and the InnoDB engine', async () => {
    const tables = await db.query<{ name: string; engine: string | null; hasKey: number }>(
      `SELECT t.TABLE_NAME AS name, t.ENGINE AS engine,
              EXISTS (SELECT 1 FROM information_schema.TABLE_CONSTRAINTS c
                      WHERE c.TABLE_SCHEMA = t.TABLE_SCHEMA AND c.TABLE_NAME = t.TABLE_NAME
                        AND c.CONSTRAINT_TYPE = 'PRIMARY KEY') AS hasKey
         FROM information_schema.TABLES t
        WHERE t.TABLE_SCHEMA = DATABASE() AND t.TABLE_TYPE = 'BASE TABLE'`,
      { type: QueryTypes.SELECT },
    );
    expect(tables.length).toBeGreaterThan(20);
    expect(tables.filter((t) => t.engine !== 'InnoDB').map((t) => t.name)).toEqual([]);
    expect(tables.filter((t) => Number(t.hasKey) !== 1).map((t) => t.name)).toEqual([]);
  });

  it('uses no statement Galera does not replicate (LOCK TABLES, GET_LOCK, MyISAM tables) in the server code', () => {
    const files = (dir: string): string[] =>
      readdirSync(dir).flatMap((name) => {
        const path = join(dir, name);
        return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
      });
    const offending = files('server').filter((path) => /\bLOCK\s+TABLES\b|\bGET_LOCK\s*\(|\bMyISAM\b/i.test(readFileSync(path, 'utf8')));
    expect(offending).toEqual([]);
  });
});
