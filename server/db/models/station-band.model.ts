import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class StationBandModel extends Model<InferAttributes<StationBandModel>, InferCreationAttributes<StationBandModel>> {
  declare id: CreationOptional<number>;
  declare stationId: number;
  declare bandId: string;
  declare enabled: boolean;
  declare calibrationOffsetHz: number | null;
  declare calibrationSource: 'typed' | 'measured' | 'reports' | null;
  declare calibratedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    StationBandModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        bandId: { type: DataTypes.STRING(8), allowNull: false },
        enabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        calibrationOffsetHz: { type: DataTypes.DOUBLE, allowNull: true },
        calibrationSource: { type: DataTypes.STRING(10), allowNull: true },
        calibratedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'station_bands' },
    );
  }
}
