import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Reports, heard slots and best SNR per station, UTC hour and band: what a long period's hour × band chart and report
 * count read instead of every slot row (a year is about 30 times fewer rows). Filled from the per-slot aggregate.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('reception_hour_counts', {
    stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    hourStart: { type: DataTypes.DATE, allowNull: false, primaryKey: true },
    bandId: { type: DataTypes.STRING(8), allowNull: false, primaryKey: true },
    reports: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    slots: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    bestSnrDb: { type: DataTypes.SMALLINT, allowNull: false },
  });
  await qi.sequelize.query(
    `INSERT INTO reception_hour_counts (stationId, hourStart, bandId, reports, slots, bestSnrDb)
       SELECT stationId, DATE_FORMAT(slotStart, '%Y-%m-%d %H:00:00'), bandId, SUM(reports), COUNT(*), MAX(bestSnrDb)
         FROM reception_slot_counts GROUP BY stationId, DATE_FORMAT(slotStart, '%Y-%m-%d %H:00:00'), bandId`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('reception_hour_counts');
}
