import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class StationModel extends Model<InferAttributes<StationModel>, InferCreationAttributes<StationModel>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare name: string;
  declare callsign: string;
  declare locator: string;
  declare notes: string;
  declare unitId: number | null;
  declare region: string;
  declare audioOffsetHz: number;
  declare transmitEnabled: boolean;
  declare referenceErrorPpm: number | null;
  declare suspendedAt: Date | null;
  declare suspendedReason: string | null;
  declare suspendedByClubId: number | null;
  declare suspendedByUserId: CreationOptional<number | null>;
  declare suspendedByName: CreationOptional<string | null>;
  declare suspendedByClubName: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    StationModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        callsign: { type: DataTypes.STRING(12), allowNull: false },
        locator: { type: DataTypes.STRING(8), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false },
        unitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        region: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'itu1' },
        audioOffsetHz: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1500 },
        transmitEnabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        referenceErrorPpm: { type: DataTypes.DOUBLE, allowNull: true },
        suspendedAt: { type: DataTypes.DATE(3), allowNull: true },
        suspendedReason: { type: DataTypes.STRING(300), allowNull: true },
        suspendedByClubId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        suspendedByUserId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        suspendedByName: { type: DataTypes.STRING(80), allowNull: true },
        suspendedByClubName: { type: DataTypes.STRING(120), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'stations' },
    );
  }
}
