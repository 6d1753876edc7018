import { DataTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/**
 * The studio board's data (DESIGN.md T3): briefs a coordinator hands to a maker, a monthly target
 * per maker, the brief a tutorial was started from, and a tutorial's scheduled publish time (the
 * queue job's id is kept so a cancel or a new time can withdraw it).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('briefs', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    studio_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'studios', key: 'id' }, onDelete: 'CASCADE' },
    maker_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.TEXT, allowNull: false },
    due_date: { type: DataTypes.DATEONLY, allowNull: false },
    features: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...stamps,
  });
  await qi.addIndex('briefs', ['studio_id', 'due_date']);
  await qi.addIndex('briefs', ['maker_id']);

  await qi.createTable('monthly_targets', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    studio_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'studios', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    per_month: { type: DataTypes.INTEGER, allowNull: false },
    ...stamps,
  });
  await qi.addIndex('monthly_targets', ['studio_id', 'user_id'], { unique: true });
  await qi.sequelize.query(`ALTER TABLE monthly_targets ADD CONSTRAINT monthly_targets_range CHECK (per_month BETWEEN 1 AND 100)`);

  // One tutorial per brief; deleting the tutorial opens the brief again.
  await qi.addColumn('tutorials', 'brief_id', { type: DataTypes.UUID, allowNull: true, references: { model: 'briefs', key: 'id' }, onDelete: 'SET NULL' });
  // (PostgreSQL lets any number of rows share a null in a unique index.)
  await qi.addIndex('tutorials', ['brief_id'], { unique: true, name: 'tutorials_brief_id_unique' });
  await qi.addColumn('tutorials', 'publish_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('tutorials', 'publish_time_zone', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('tutorials', 'publish_scheduled_by_id', {
    type: DataTypes.UUID,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await qi.addColumn('tutorials', 'publish_job_id', { type: DataTypes.TEXT, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const c of ['publish_job_id', 'publish_scheduled_by_id', 'publish_time_zone', 'publish_at', 'brief_id']) await qi.removeColumn('tutorials', c);
  await qi.dropTable('monthly_targets');
  await qi.dropTable('briefs');
}
