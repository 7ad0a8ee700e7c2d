import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A beacon's hardware. `spec` holds the validated description (shared `unitInput`) as JSON text. */
export class UnitModel extends Model<InferAttributes<UnitModel>, InferCreationAttributes<UnitModel>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare name: string;
  declare spec: string;
  /** fixed | hand | switched (shared FILTER_SELECTIONS) */
  declare filterSelection: CreationOptional<string>;
  declare fittedFilterIndex: CreationOptional<number | null>;
  declare fittedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    UnitModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        spec: { type: DataTypes.TEXT('medium'), allowNull: false },
        filterSelection: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'switched' },
        fittedFilterIndex: { type: DataTypes.INTEGER, allowNull: true },
        fittedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'units' },
    );
  }
}
