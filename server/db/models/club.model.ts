import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ClubModel extends Model<InferAttributes<ClubModel>, InferCreationAttributes<ClubModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare maxPowerDbm: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ClubModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        maxPowerDbm: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'clubs' },
    );
  }
}
