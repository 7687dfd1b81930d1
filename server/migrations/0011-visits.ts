import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const uint = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });
const ref = (model: string, allowNull = false) => ({ ...uint(allowNull), references: { model, key: 'id' } });

/** Visits to a site, the decisions taken on live tags when one ends, recently opened places, client summaries. */
export const visits: Migration = {
  name: '0011-visits',
  async up({ context: qi }) {
    await qi.createTable('visits', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      user_id: ref('users'),
      purpose: { type: DataTypes.TEXT, allowNull: false },
      job_reference: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
      started_at: { type: DataTypes.DATE(3), allowNull: false },
      ended_at: { type: DataTypes.DATE(3), allowNull: true },
      end_note: { type: DataTypes.TEXT, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // One visit in progress per person: the generated column is the user while open and NULL once ended,
    // and a unique index ignores NULLs.
    await qi.sequelize.query('ALTER TABLE visits ADD COLUMN open_user_id INT UNSIGNED AS (IF(ended_at IS NULL, user_id, NULL)) PERSISTENT');
    await qi.addIndex('visits', ['open_user_id'], { unique: true, name: 'visits_one_open_per_user' });
    await qi.addIndex('visits', ['site_id', 'started_at']);
    await qi.addIndex('visits', ['user_id', 'started_at']);
    await qi.sequelize.query('ALTER TABLE visits ADD CONSTRAINT visits_end_after_start CHECK (ended_at IS NULL OR ended_at >= started_at)');
    // An ended visit is a record: it cannot be reopened, rewritten or deleted.
    await qi.sequelize.query(
      `CREATE TRIGGER visits_no_update_after_end BEFORE UPDATE ON visits FOR EACH ROW
       IF OLD.ended_at IS NOT NULL THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'an ended visit cannot be changed'; END IF`,
    );
    await qi.sequelize.query(
      `CREATE TRIGGER visits_no_delete BEFORE DELETE ON visits FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'visits are ended, never deleted'`,
    );

    await qi.createTable('visit_decisions', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      visit_id: ref('visits'),
      tag_id: ref('tags'),
      action: { type: DataTypes.STRING(20), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false },
      expires_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('visit_decisions', ['visit_id', 'tag_id'], { unique: true });
    await qi.sequelize.query("ALTER TABLE visit_decisions ADD CONSTRAINT visit_decisions_action CHECK (action IN ('leave', 'handover', 'clear'))");
    for (const op of ['UPDATE', 'DELETE']) {
      await qi.sequelize.query(
        `CREATE TRIGGER visit_decisions_no_${op.toLowerCase()} BEFORE ${op} ON visit_decisions FOR EACH ROW
         SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'visit_decisions is append-only'`,
      );
    }

    // The sites and plant rooms a person opened, newest first on their home screen.
    await qi.createTable('recent_places', {
      user_id: { ...ref('users'), primaryKey: true },
      place_type: { type: DataTypes.STRING(12), allowNull: false, primaryKey: true },
      place_id: { ...uint(), primaryKey: true },
      opened_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('recent_places', ['user_id', 'opened_at']);

    // Off unless the organisation turns it on: a client contact is outside the organisation.
    await qi.addColumn('organisations', 'visit_summary_to_client', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  },
  async down({ context: qi }) {
    await qi.removeColumn('organisations', 'visit_summary_to_client');
    await qi.dropTable('recent_places');
    await qi.dropTable('visit_decisions');
    await qi.dropTable('visits');
  },
};
