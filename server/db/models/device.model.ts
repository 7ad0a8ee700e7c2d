import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

const pk = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const bigPk = { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true };
const stationRef = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false };

/** A station's device credential; only the token's SHA-256 is stored. */
export class DeviceTokenModel extends Model<InferAttributes<DeviceTokenModel>, InferCreationAttributes<DeviceTokenModel>> {
  declare id: CreationOptional<number>;
  declare stationId: number;
  declare tokenHash: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    DeviceTokenModel.init(
      {
        id: pk,
        stationId: { ...stationRef, unique: true },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'device_tokens' },
    );
  }
}

export class HeartbeatModel extends Model<InferAttributes<HeartbeatModel>, InferCreationAttributes<HeartbeatModel>> {
  declare id: CreationOptional<number>;
  declare stationId: number;
  declare receivedAt: Date;
  declare report: string;
  declare clockOffsetMs: number | null;
  declare temperatureC: number | null;
  static initModel(sequelize: Sequelize) {
    HeartbeatModel.init(
      {
        id: bigPk,
        stationId: stationRef,
        receivedAt: { type: DataTypes.DATE(3), allowNull: false },
        report: { type: DataTypes.TEXT, allowNull: false },
        clockOffsetMs: { type: DataTypes.DOUBLE, allowNull: true },
        temperatureC: { type: DataTypes.DOUBLE, allowNull: true },
      },
      { sequelize, tableName: 'device_heartbeats', timestamps: false },
    );
  }
}

export class DeviceTransmissionModel extends Model<
  InferAttributes<DeviceTransmissionModel>,
  InferCreationAttributes<DeviceTransmissionModel>
> {
  declare id: CreationOptional<number>;
  declare stationId: number;
  declare startedAt: Date;
  declare bandId: string;
  declare frequencyHz: number;
  declare messageText: string;
  declare receivedAt: Date;
  static initModel(sequelize: Sequelize) {
    DeviceTransmissionModel.init(
      {
        id: bigPk,
        stationId: stationRef,
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        bandId: { type: DataTypes.STRING(8), allowNull: false },
        frequencyHz: { type: DataTypes.DOUBLE, allowNull: false },
        messageText: { type: DataTypes.STRING(40), allowNull: false },
        receivedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'device_transmissions', timestamps: false },
    );
  }
}

export class AlertSettingsModel extends Model<InferAttributes<AlertSettingsModel>, InferCreationAttributes<AlertSettingsModel>> {
  declare stationId: number;
  declare silentMinutes: number;
  declare clockOffsetMs: number;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    AlertSettingsModel.init(
      {
        stationId: { ...stationRef, primaryKey: true },
        silentMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 },
        clockOffsetMs: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1000 },
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'alert_settings', createdAt: false },
    );
  }
}

export class AlertModel extends Model<InferAttributes<AlertModel>, InferCreationAttributes<AlertModel>> {
  declare id: CreationOptional<number>;
  declare stationId: number;
  declare rule: string;
  declare message: string;
  declare openedAt: Date;
  declare lastSeenAt: Date;
  declare resolvedAt: Date | null;
  declare mailedAt: Date | null;
  declare openKey: string | null;
  static initModel(sequelize: Sequelize) {
    AlertModel.init(
      {
        id: pk,
        stationId: stationRef,
        rule: { type: DataTypes.STRING(30), allowNull: false },
        message: { type: DataTypes.STRING(300), allowNull: false },
        openedAt: { type: DataTypes.DATE(3), allowNull: false },
        lastSeenAt: { type: DataTypes.DATE(3), allowNull: false },
        resolvedAt: { type: DataTypes.DATE(3), allowNull: true },
        mailedAt: { type: DataTypes.DATE(3), allowNull: true },
        openKey: { type: DataTypes.STRING(60), allowNull: true, unique: true },
      },
      { sequelize, tableName: 'alerts', timestamps: false },
    );
  }
}
