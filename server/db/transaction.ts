import type { Transaction } from 'sequelize';
import { UserModel } from './models/user.model';

/** Runs fn in one transaction on the app's connection (a write and its audit entry commit together). */
export function inTransaction<T>(fn: (transaction: Transaction) => Promise<T>): Promise<T> {
  return UserModel.sequelize!.transaction(fn);
}
