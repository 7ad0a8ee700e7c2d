import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type PairingStatus = 'pending' | 'approved' | 'refused' | 'spent';

/** A device waiting to be paired: its codes (hashed), what it reported, and the owner's decision. */
export class DevicePairingModel extends Model<InferAttributes<DevicePairingModel>, InferCreationAttributes<DevicePairingModel>> {
  declare id: CreationOptional<number>;
  declare deviceCodeHash: string;
  declare userCodeHash: string;
  declare targetKind: string;
  declare targetId: number | null;
  declare status: PairingStatus;
  declare model: string | null;
  declare firmware: string | null;
  declare intervalS: number;
  declare lastPolledAt: Date | null;
  declare expiresAt: Date;
  declare decidedById: number | null;
  declare decidedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    DevicePairingModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        deviceCodeHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        userCodeHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        targetKind: { type: DataTypes.STRING(20), allowNull: false },
        targetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        status: { type: DataTypes.STRING(10), allowNull: false },
        model: { type: DataTypes.STRING(60), allowNull: true },
        firmware: { type: DataTypes.STRING(40), allowNull: true },
        intervalS: { type: DataTypes.INTEGER, allowNull: false },
        lastPolledAt: { type: DataTypes.DATE(3), allowNull: true },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        decidedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        decidedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'device_pairings' },
    );
  }
}

/** Wrong pairing codes typed per key (an account or an address) in the current window. */
export class PairingAttemptModel extends Model<InferAttributes<PairingAttemptModel>, InferCreationAttributes<PairingAttemptModel>> {
  declare attemptKey: string;
  declare windowStart: Date;
  declare attempts: number;
  static initModel(sequelize: Sequelize) {
    PairingAttemptModel.init(
      {
        attemptKey: { type: DataTypes.STRING(80), primaryKey: true },
        windowStart: { type: DataTypes.DATE(3), allowNull: false },
        attempts: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, tableName: 'pairing_attempts', timestamps: false },
    );
  }
}
