import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class StationModel extends Model<InferAttributes<StationModel>, InferCreationAttributes<StationModel>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare name: string;
  declare callsign: string;
  declare locator: string;
  declare notes: string;
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
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'stations' },
    );
  }
}
