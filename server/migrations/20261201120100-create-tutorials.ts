import { DataTypes, type QueryInterface } from 'sequelize';

/** Tutorials: one project of a studio, with its review state and ruler settings. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('tutorials', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    studio_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'studios', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.TEXT, allowNull: false },
    slug: { type: DataTypes.TEXT, allowNull: false },
    state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
    due_date: { type: DataTypes.DATEONLY, allowNull: true },
    precision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 16 },
    default_unit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'in' },
    published_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addConstraint('tutorials', { fields: ['studio_id', 'slug'], type: 'unique', name: 'tutorials_studio_slug' });
  await qi.addIndex('tutorials', ['studio_id', 'state']);
  await qi.sequelize.query(
    `ALTER TABLE tutorials ADD CONSTRAINT tutorials_state CHECK (state IN ('draft','in_review','needs_changes','approved','published'))`,
  );
  await qi.sequelize.query(`ALTER TABLE tutorials ADD CONSTRAINT tutorials_precision CHECK (precision IN (8,16,32))`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('tutorials');
}
