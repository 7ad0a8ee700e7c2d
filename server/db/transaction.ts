import type { Transaction } from 'sequelize';

/**
 * The one way a service opens a transaction: it is handed a runner (the app's Sequelize instance,
 * passed down from createApp) and calls `db.transaction(async (transaction) => …)`. Repos take the
 * transaction as their last argument; nothing reaches a model's static `sequelize`.
 */
export type TransactionRunner = {
  transaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T>;
};

export type { Transaction };
