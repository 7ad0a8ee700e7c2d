import type { Transaction } from 'sequelize';
import type { Notice } from '@/shared/api/answers';
import { AppError } from '../../lib/app-error';
import * as repo from './notifications.repo';

export type { Notice };

export async function notify(userId: number, kind: string, message: string, link: string | null, transaction?: Transaction) {
  await repo.insert({ userId, kind, message: message.slice(0, 500), link }, transaction);
}

export async function listFor(userId: number): Promise<Notice[]> {
  const rows = await repo.findFor(userId);
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    message: r.message,
    link: r.link,
    readAt: r.readAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

export async function markAllRead(userId: number): Promise<{ marked: number }> {
  return { marked: await repo.markAllRead(userId, new Date()) };
}

export async function markRead(userId: number, id: number) {
  if (!(await repo.markRead(userId, id, new Date())) && !(await repo.exists(userId, id)))
    throw new AppError('not-found', `Notice ${id} does not exist`);
}
