import type { QueryInterface } from 'sequelize';

/** Batches by arrival time: the "transmitting but unheard" alert asks whether reports for others keep arriving on a band. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addIndex('reception_batches', ['receivedAt'], { name: 'batches_received' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('reception_batches', 'batches_received');
}
