import { loadConfig } from '../config';
import { migrateToLatest } from './migrator';
import { createSequelize } from './sequelize';

async function main() {
  const config = loadConfig();
  const sequelize = createSequelize(config.DATABASE_URL);
  const applied = await migrateToLatest(sequelize);
  console.log(applied.length ? `Applied ${applied.map((m) => m.name).join(', ')}` : 'Schema is up to date');
  await sequelize.close();
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
