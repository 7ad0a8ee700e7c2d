import { Op, type Transaction } from 'sequelize';
import { NotificationModel } from '../../db/models/club-extras.model';
import { AppError } from '../../lib/app-error';

export type Notice = { id: number; kind: string; message: string; link: string | null; readAt: string | null; createdAt: string };

export async function notify(userId: number, kind: string, message: string, link: string | null, transaction?: Transaction) {
  await NotificationModel.create({ userId, kind, message: message.slice(0, 500), link, readAt: null }, { transaction });
}

export async function listFor(userId: number): Promise<Notice[]> {
  const rows = await NotificationModel.findAll({ where: { userId }, order: [['id', 'DESC']], limit: 100 });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    message: r.message,
    link: r.link,
    readAt: r.readAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

export async function markRead(userId: number, id: number) {
  const [count] = await NotificationModel.update({ readAt: new Date() }, { where: { id, userId, readAt: { [Op.is]: null } } });
  if (count === 0 && !(await NotificationModel.findOne({ where: { id, userId } })))
    throw new AppError('not-found', `Notice ${id} does not exist`);
}
