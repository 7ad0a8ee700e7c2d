import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class UnitPhotoModel extends Model<InferAttributes<UnitPhotoModel>, InferCreationAttributes<UnitPhotoModel>> {
  declare id: CreationOptional<number>;
  declare unitId: number;
  declare storageKey: string;
  declare thumbKey: string;
  declare contentType: string;
  declare bytes: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    UnitPhotoModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        unitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        thumbKey: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(40), allowNull: false },
        bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'unit_photos' },
    );
  }
}
