import type { Sequelize } from 'sequelize';

/** True when the database answers a trivial query. */
export async function databaseAnswers(sequelize: Sequelize) {
  try {
    await sequelize.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
