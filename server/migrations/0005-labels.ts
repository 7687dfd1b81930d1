import { DataTypes } from 'sequelize';
import type { Migration } from './index';

export const labels: Migration = {
  name: '0005-labels',
  async up({ context: qi }) {
    await qi.createTable('retired_labels', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'organisations', key: 'id' } },
      asset_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'assets', key: 'id' } },
      code: { type: DataTypes.CHAR(12), allowNull: false, unique: true },
      retired_at: { type: DataTypes.DATE(3), allowNull: false },
      retired_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    });
    await qi.addIndex('retired_labels', ['asset_id']);
  },
  async down({ context: qi }) {
    await qi.dropTable('retired_labels');
  },
};
