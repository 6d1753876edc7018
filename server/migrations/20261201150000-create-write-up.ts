import { DataTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const tutorialRef = { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' };
const userRef = { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' };

/**
 * The write-up: one current document per tutorial with a version number (for the stale-save
 * check), revisions to look back at, and the supplies list with its disclosure.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('articles', {
    tutorial_id: { ...tutorialRef, primaryKey: true },
    doc: { type: DataTypes.JSONB, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    updated_by_id: userRef,
    ...stamps,
  });
  await qi.createTable('revisions', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: tutorialRef,
    version: { type: DataTypes.INTEGER, allowNull: false },
    doc: { type: DataTypes.JSONB, allowNull: false },
    author_id: userRef,
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...stamps,
  });
  await qi.addIndex('revisions', ['tutorial_id', 'created_at']);
  await qi.createTable('supplies', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: tutorialRef,
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    category: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    quantity: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    url: { type: DataTypes.TEXT, allowNull: true },
    sponsored: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    discount_code: { type: DataTypes.TEXT, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('supplies', ['tutorial_id', 'position']);
  await qi.sequelize.query(
    `ALTER TABLE supplies ADD CONSTRAINT supplies_category CHECK (category IN ('paper','cardstock','embellishment','adhesive','tool','other'))`,
  );
  await qi.addColumn('tutorials', 'disclosure', { type: DataTypes.TEXT, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('tutorials', 'disclosure');
  for (const t of ['supplies', 'revisions', 'articles']) await qi.dropTable(t);
}
