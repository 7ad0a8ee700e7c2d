import { DataTypes } from 'sequelize';

/** Column shapes the migrations share. */
export const timestamps = {
  createdAt: { type: DataTypes.DATE(3), allowNull: false },
  updatedAt: { type: DataTypes.DATE(3), allowNull: false },
};
export const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
export const ref = (table: string, allowNull = false, onDelete = 'CASCADE') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});
