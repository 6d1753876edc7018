import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * What is published stays as approved (DESIGN.md T4). A tutorial's versions are frozen copies of
 * everything readers see (write-up, cut list, supplies, disclosure, chapters, stills, title),
 * taken when a coordinator approves it, publishes it or sends it back; readers read the version
 * the tutorial points at as live, never the draft. `update_state` is the review state of the
 * changes made after publishing (null: none), beside `state`, which stays "published" meanwhile.
 * The tutorial's two version ids are plain columns, not foreign keys: a foreign key each way
 * would make deleting a tutorial fight its own cascade.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('tutorial_versions', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.TEXT, allowNull: false },
    content: { type: DataTypes.JSONB, allowNull: false },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('tutorial_versions', ['tutorial_id', 'created_at']);
  await qi.sequelize.query(`ALTER TABLE tutorial_versions ADD CONSTRAINT tutorial_versions_kind CHECK (kind IN ('approved','published','sent_back'))`);

  await qi.addColumn('tutorials', 'live_version_id', { type: DataTypes.UUID, allowNull: true });
  await qi.addColumn('tutorials', 'approved_version_id', { type: DataTypes.UUID, allowNull: true });
  await qi.addColumn('tutorials', 'update_state', { type: DataTypes.TEXT, allowNull: true });
  // The history says which moves were an update's.
  await qi.addColumn('state_changes', 'of_update', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  await qi.sequelize.query(
    `ALTER TABLE tutorials ADD CONSTRAINT tutorials_update_state CHECK (update_state IS NULL OR update_state IN ('draft','in_review','needs_changes','approved'))`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('state_changes', 'of_update');
  await qi.sequelize.query('ALTER TABLE tutorials DROP CONSTRAINT IF EXISTS tutorials_update_state');
  for (const c of ['update_state', 'approved_version_id', 'live_version_id']) await qi.removeColumn('tutorials', c);
  await qi.dropTable('tutorial_versions');
}
