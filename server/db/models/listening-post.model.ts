import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A receive-only station that posts what it decoded; only its token's SHA-256 is stored. */
export class ListeningPostModel extends Model<InferAttributes<ListeningPostModel>, InferCreationAttributes<ListeningPostModel>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare name: string;
  declare callsign: string;
  declare locator: string;
  declare tokenHash: string | null;
  declare tokenIssuedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  static initModel(sequelize: Sequelize) {
    ListeningPostModel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        callsign: { type: DataTypes.STRING(12), allowNull: false },
        locator: { type: DataTypes.STRING(8), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: true, unique: true },
        tokenIssuedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'listening_posts' },
    );
  }
}
