import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const owner = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' };
const count = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 };
const timestamps = { createdAt: { type: DataTypes.DATE(3), allowNull: false }, updatedAt: { type: DataTypes.DATE(3), allowNull: false } };

/** File imports of reception reports: the job and its progress, the rows it rejected, and mappings saved by name. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('reception_imports', {
    id,
    ownerId: owner,
    fileName: { type: DataTypes.STRING(255), allowNull: false },
    status: { type: DataTypes.ENUM('running', 'done', 'failed'), allowNull: false, defaultValue: 'running' },
    bytesTotal: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    bytesRead: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 },
    rowsRead: count,
    imported: count,
    duplicates: count,
    rejected: count,
    mapping: { type: DataTypes.TEXT, allowNull: false },
    error: { type: DataTypes.STRING(1000), allowNull: true },
    /** which server process runs the job (host:pid:start), so start-up recovery fails only jobs of dead processes */
    processId: { type: DataTypes.STRING(160), allowNull: true },
    heartbeatAt: { type: DataTypes.DATE(3), allowNull: false },
    finishedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('reception_imports', ['ownerId', 'createdAt'], { name: 'imports_owner_time' });
  await qi.addIndex('reception_imports', ['status'], { name: 'imports_status' });

  await qi.createTable('reception_import_rejections', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    importId: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'reception_imports', key: 'id' },
      onDelete: 'CASCADE',
    },
    rowNumber: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    columnName: { type: DataTypes.STRING(120), allowNull: false },
    reason: { type: DataTypes.STRING(300), allowNull: false },
  });
  await qi.addIndex('reception_import_rejections', ['importId', 'rowNumber'], { name: 'import_rejections_row' });

  await qi.createTable('reception_mappings', {
    id,
    ownerId: owner,
    name: { type: DataTypes.STRING(80), allowNull: false },
    mapping: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('reception_mappings', ['ownerId', 'name'], { name: 'mappings_owner_name', unique: true });

  // Start-up recovery sums what each import's committed chunks stored.
  await qi.addIndex('reception_batches', ['importId'], { name: 'batches_import' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('reception_batches', 'batches_import');
  for (const table of ['reception_mappings', 'reception_import_rejections', 'reception_imports']) await qi.dropTable(table);
}
