import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import * as m0001 from './migrations/0001-accounts-and-stations';
import * as m0002 from './migrations/0002-units-and-station-bands';
import * as m0003 from './migrations/0003-schedules-and-clubs';
import * as m0004 from './migrations/0004-devices';
import * as m0005 from './migrations/0005-suspended-by';
import * as m0006 from './migrations/0006-filter-selection';
import * as m0007 from './migrations/0007-device-pairing';
import * as m0008 from './migrations/0008-reception-reports';
import * as m0008b from './migrations/0008-b-reach-per-watt';
import * as m0010 from './migrations/0010-reception-imports';
import * as m0011 from './migrations/0011-station-change-feed';
import * as m0014 from './migrations/0014-email-changes';
import * as m0018 from './migrations/0018-reception-hour-counts';
import * as m0019 from './migrations/0019-batches-received';

// An explicit list: the same code path under tsx, jest and compiled output.
const migrations = [
  { name: '0001-accounts-and-stations', ...m0001 },
  { name: '0002-units-and-station-bands', ...m0002 },
  { name: '0003-schedules-and-clubs', ...m0003 },
  { name: '0004-devices', ...m0004 },
  { name: '0005-suspended-by', ...m0005 },
  { name: '0006-filter-selection', ...m0006 },
  { name: '0007-device-pairing', ...m0007 },
  { name: '0008-reception-reports', ...m0008 },
  { name: '0008-b-reach-per-watt', ...m0008b },
  { name: '0010-reception-imports', ...m0010 },
  { name: '0011-station-change-feed', ...m0011 },
  { name: '0014-email-changes', ...m0014 },
  { name: '0018-reception-hour-counts', ...m0018 },
  { name: '0019-batches-received', ...m0019 },
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
