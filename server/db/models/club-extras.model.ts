import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

const stamps = { createdAt: DataTypes.DATE(3), updatedAt: DataTypes.DATE(3) };
const pk = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const fk = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });

/** A single-use, expiring invitation to join a club; only the token's SHA-256 is stored. */
export class InvitationModel extends Model<InferAttributes<InvitationModel>, InferCreationAttributes<InvitationModel>> {
  declare id: CreationOptional<number>;
  declare clubId: number;
  declare email: string;
  declare tokenHash: string;
  declare invitedById: number;
  declare expiresAt: Date;
  declare acceptedAt: Date | null;
  declare acceptedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    InvitationModel.init(
      {
        id: pk,
        clubId: fk(),
        email: { type: DataTypes.STRING(190), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        invitedById: fk(),
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
        acceptedById: fk(true),
        ...stamps,
      },
      { sequelize, tableName: 'club_invitations' },
    );
  }
}

export type ProposalStatus = 'pending' | 'accepted' | 'declined' | 'withdrawn';

/** An admin's proposed audio offset for a member's station; nothing changes until the owner accepts. */
export class OffsetProposalModel extends Model<InferAttributes<OffsetProposalModel>, InferCreationAttributes<OffsetProposalModel>> {
  declare id: CreationOptional<number>;
  declare clubId: number;
  declare stationId: number;
  declare proposedById: number;
  declare currentOffsetHz: number;
  declare proposedOffsetHz: number;
  declare reason: string;
  declare status: CreationOptional<ProposalStatus>;
  declare decidedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    OffsetProposalModel.init(
      {
        id: pk,
        clubId: fk(),
        stationId: fk(),
        proposedById: fk(),
        currentOffsetHz: { type: DataTypes.DOUBLE, allowNull: false },
        proposedOffsetHz: { type: DataTypes.DOUBLE, allowNull: false },
        reason: { type: DataTypes.STRING(300), allowNull: false },
        status: { type: DataTypes.ENUM('pending', 'accepted', 'declined', 'withdrawn'), allowNull: false, defaultValue: 'pending' },
        decidedAt: { type: DataTypes.DATE(3), allowNull: true },
        ...stamps,
      },
      { sequelize, tableName: 'offset_proposals' },
    );
  }
}

export class NotificationModel extends Model<InferAttributes<NotificationModel>, InferCreationAttributes<NotificationModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: string;
  declare message: string;
  declare link: string | null;
  declare readAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    NotificationModel.init(
      {
        id: pk,
        userId: fk(),
        kind: { type: DataTypes.STRING(40), allowNull: false },
        message: { type: DataTypes.STRING(500), allowNull: false },
        link: { type: DataTypes.STRING(200), allowNull: true },
        readAt: { type: DataTypes.DATE(3), allowNull: true },
        ...stamps,
      },
      { sequelize, tableName: 'notifications' },
    );
  }
}

export class AuditEntryModel extends Model<InferAttributes<AuditEntryModel>, InferCreationAttributes<AuditEntryModel>> {
  declare id: CreationOptional<number>;
  declare at: Date;
  declare actorId: number | null;
  declare actorName: string;
  declare ownerId: number | null;
  declare clubId: number | null;
  declare action: string;
  declare entityType: string;
  declare entityId: number | null;
  declare summary: string;
  declare before: string | null;
  declare after: string | null;
  static initModel(sequelize: Sequelize) {
    AuditEntryModel.init(
      {
        id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
        at: { type: DataTypes.DATE(3), allowNull: false },
        actorId: fk(true),
        actorName: { type: DataTypes.STRING(80), allowNull: false },
        ownerId: fk(true),
        clubId: fk(true),
        action: { type: DataTypes.STRING(60), allowNull: false },
        entityType: { type: DataTypes.STRING(30), allowNull: false },
        entityId: fk(true),
        summary: { type: DataTypes.STRING(300), allowNull: false },
        before: { type: DataTypes.TEXT('medium'), allowNull: true },
        after: { type: DataTypes.TEXT('medium'), allowNull: true },
      },
      { sequelize, tableName: 'audit_entries', timestamps: false },
    );
  }
}
