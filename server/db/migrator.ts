import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import * as m0001 from './migrations/0001-accounts-and-stations';
import * as m0002 from './migrations/0002-units-and-station-bands';
import * as m0003 from './migrations/0003-schedules-and-clubs';
import * as m0004 from './migrations/0004-devices';
import * as m0008 from './migrations/0008-reception-reports';
import * as m0010 from './migrations/0010-reception-imports';

// An explicit list: the same code path under tsx, jest and compiled output.
const migrations = [
  { name: '0001-accounts-and-stations', ...m0001 },
  { name: '0002-units-and-station-bands', ...m0002 },
  { name: '0003-schedules-and-clubs', ...m0003 },
  { name: '0004-devices', ...m0004 },
  { name: '0008-reception-reports', ...m0008 },
  { name: '0010-reception-imports', ...m0010 },
];

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: migrations.map(({ name, up, down }) => ({ name, up, down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrateToLatest(sequelize: Sequelize) {
  return createMigrator(sequelize).up();
}
