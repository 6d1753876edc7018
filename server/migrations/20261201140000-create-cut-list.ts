import { DataTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const tutorialRef = { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' };

/**
 * The cut list: pieces with exact lengths stored as text ("169/16 in", never floats), the
 * materials they are cut from with their stock sheet, and transcript mentions dismissed as not pieces.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('materials', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: tutorialRef,
    name: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'cardstock' },
    sheet_width: { type: DataTypes.TEXT, allowNull: false },
    sheet_height: { type: DataTypes.TEXT, allowNull: false },
    rotate: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    ...stamps,
  });
  await qi.addConstraint('materials', { fields: ['tutorial_id', 'name'], type: 'unique', name: 'materials_tutorial_name' });
  await qi.createTable('pieces', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: tutorialRef,
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    name: { type: DataTypes.TEXT, allowNull: false },
    material: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    quantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    shape: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'rect' },
    width: { type: DataTypes.TEXT, allowNull: false },
    height: { type: DataTypes.TEXT, allowNull: false },
    score_lines: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    mat_on_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'pieces', key: 'id' }, onDelete: 'SET NULL' },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    said_at_ms: { type: DataTypes.INTEGER, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('pieces', ['tutorial_id', 'position']);
  await qi.sequelize.query(`ALTER TABLE pieces ADD CONSTRAINT pieces_shape CHECK (shape IN ('rect','circle'))`);
  await qi.sequelize.query(`ALTER TABLE pieces ADD CONSTRAINT pieces_quantity CHECK (quantity >= 1)`);
  await qi.createTable('mention_dismissals', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: tutorialRef,
    mention_key: { type: DataTypes.TEXT, allowNull: false },
    ...stamps,
  });
  await qi.addConstraint('mention_dismissals', { fields: ['tutorial_id', 'mention_key'], type: 'unique', name: 'mention_dismissals_key' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['mention_dismissals', 'pieces', 'materials']) await qi.dropTable(t);
}
