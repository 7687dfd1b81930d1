import { DataTypes } from 'sequelize';
import type { Migration } from './index';

/** Photos of the lock or tag in place belong to a tag. */
export const tagPhotos: Migration = {
  name: '0007-tag-photos',
  async up({ context: qi }) {
    await qi.addColumn('photos', 'tag_id', { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'tags', key: 'id' } });
    await qi.addIndex('photos', ['tag_id']);
    // Each photo still belongs to exactly one thing: an item, a plant room or now a tag.
    await qi.sequelize.query('ALTER TABLE photos DROP CONSTRAINT photos_one_owner');
    await qi.sequelize.query(
      'ALTER TABLE photos ADD CONSTRAINT photos_one_owner CHECK ((asset_id IS NOT NULL) + (plant_room_id IS NOT NULL) + (tag_id IS NOT NULL) = 1)',
    );
  },
  async down({ context: qi }) {
    await qi.sequelize.query('ALTER TABLE photos DROP CONSTRAINT photos_one_owner');
    await qi.removeColumn('photos', 'tag_id');
    await qi.sequelize.query('ALTER TABLE photos ADD CONSTRAINT photos_one_owner CHECK ((asset_id IS NULL) <> (plant_room_id IS NULL))');
  },
};
