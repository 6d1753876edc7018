import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * "Assemble the tutorial" proposes chapters, stills, pieces, supplies and the first draft in one
 * step. Each proposal is kept until the maker accepts or drops it, with what accepting made (so it
 * can be undone) and a key per thing proposed, so running the assembly again never proposes or
 * makes the same thing twice.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('assembly_proposals', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.TEXT, allowNull: false },
    source_key: { type: DataTypes.TEXT, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    payload: { type: DataTypes.JSONB, allowNull: false },
    state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'proposed' },
    made_id: { type: DataTypes.UUID, allowNull: true },
    undo: { type: DataTypes.JSONB, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addConstraint('assembly_proposals', { fields: ['tutorial_id', 'kind', 'source_key'], type: 'unique', name: 'assembly_proposals_key' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('assembly_proposals');
}
