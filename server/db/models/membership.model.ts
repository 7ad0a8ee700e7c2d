import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type MembershipRole = 'member' | 'admin';

export class MembershipModel extends Model<InferAttributes<MembershipModel>, InferCreationAttributes<MembershipModel>> {
  declare id: CreationOptional<number>;
  declare clubId: number;
  declare userId: number;
  declare role: MembershipRole;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MembershipModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        clubId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        role: { type: DataTypes.ENUM('member', 'admin'), allowNull: false, defaultValue: 'member' },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'club_memberships' },
    );
  }
}
