import { Sequelize, type Transaction, type TransactionOptions } from 'sequelize';
import { ListeningPostModel } from './models/listening-post.model';
import { AuditEntryModel, InvitationModel, NotificationModel, OffsetProposalModel } from './models/club-extras.model';
import { ClubModel } from './models/club.model';
import { AlertModel, AlertSettingsModel, DeviceTokenModel, DeviceTransmissionModel, HeartbeatModel } from './models/device.model';
import { MembershipModel } from './models/membership.model';
import { DevicePairingModel, PairingAttemptModel } from './models/pairing.model';
import { PasswordResetModel } from './models/password-reset.model';
import { EmailChangeModel } from './models/email-change.model';
import { ScheduleModel } from './models/schedule.model';
import { StationBandModel } from './models/station-band.model';
import { StationModel } from './models/station.model';
import { UnitPhotoModel } from './models/unit-photo.model';
import { UnitModel } from './models/unit.model';
import { UserModel } from './models/user.model';
import { retryOnConflict } from './transaction';

type Work<T> = (transaction: Transaction) => PromiseLike<T>;

/**
 * Sequelize whose managed transactions (`transaction(callback)`) are run again, whole, when they meet a write
 * conflict: an InnoDB deadlock, a lock wait timeout, or a Galera certification failure (reported as a deadlock,
 * often on COMMIT). A transaction nested in another (`{ transaction }` given) is not retried on its own: the
 * conflict rolled back the outer one too, which retries as a whole.
 */
export class RetryingSequelize extends Sequelize {
  override transaction<T>(options: TransactionOptions, autoCallback: Work<T>): Promise<T>;
  override transaction<T>(autoCallback: Work<T>): Promise<T>;
  override transaction(options?: TransactionOptions): Promise<Transaction>;
  override transaction<T>(first?: TransactionOptions | Work<T>, second?: Work<T>): Promise<T | Transaction> {
    const options = typeof first === 'function' ? undefined : first;
    const work = typeof first === 'function' ? first : second;
    if (!work) return super.transaction(options);
    if (options?.transaction) return super.transaction(options, work);
    return retryOnConflict(() => (options ? super.transaction(options, work) : super.transaction(work)));
  }
}

/** One Sequelize instance per process; models and associations are set up here only. */
export function createSequelize(databaseUrl: string): Sequelize {
  const sequelize = new RetryingSequelize(databaseUrl, {
    dialect: 'mariadb',
    logging: false,
    timezone: '+00:00',
    // A database that is down or restarting fails a request within seconds (answered 503), never hangs it:
    // connecting gives up after 2 s, waiting for a free pooled connection after 3 s.
    dialectOptions: { skipSetTimezone: true, connectTimeout: 2_000 },
    pool: { max: 10, min: 0, idle: 10_000, acquire: 3_000, evict: 1_000 },
    define: { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  });
  UserModel.initModel(sequelize);
  ClubModel.initModel(sequelize);
  MembershipModel.initModel(sequelize);
  StationModel.initModel(sequelize);
  PasswordResetModel.initModel(sequelize);
  EmailChangeModel.initModel(sequelize);
  UnitModel.initModel(sequelize);
  UnitPhotoModel.initModel(sequelize);
  StationBandModel.initModel(sequelize);
  ScheduleModel.initModel(sequelize);
  InvitationModel.initModel(sequelize);
  OffsetProposalModel.initModel(sequelize);
  NotificationModel.initModel(sequelize);
  AuditEntryModel.initModel(sequelize);
  ListeningPostModel.initModel(sequelize);
  for (const model of [DeviceTokenModel, HeartbeatModel, DeviceTransmissionModel, AlertSettingsModel, AlertModel])
    model.initModel(sequelize);
  DevicePairingModel.initModel(sequelize);
  PairingAttemptModel.initModel(sequelize);

  UserModel.hasMany(StationModel, { foreignKey: 'ownerId', as: 'stations' });
  StationModel.belongsTo(UserModel, { foreignKey: 'ownerId', as: 'owner' });
  UserModel.hasMany(MembershipModel, { foreignKey: 'userId', as: 'memberships' });
  MembershipModel.belongsTo(UserModel, { foreignKey: 'userId', as: 'user' });
  ClubModel.hasMany(MembershipModel, { foreignKey: 'clubId', as: 'memberships' });
  MembershipModel.belongsTo(ClubModel, { foreignKey: 'clubId', as: 'club' });
  UserModel.hasMany(UnitModel, { foreignKey: 'ownerId', as: 'units' });
  UnitModel.belongsTo(UserModel, { foreignKey: 'ownerId', as: 'owner' });
  UnitModel.hasMany(UnitPhotoModel, { foreignKey: 'unitId', as: 'photos' });
  StationModel.hasMany(StationBandModel, { foreignKey: 'stationId', as: 'bands' });
  StationModel.hasOne(ScheduleModel, { foreignKey: 'stationId', as: 'schedule' });
  return sequelize;
}
