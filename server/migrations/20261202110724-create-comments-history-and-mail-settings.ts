import { randomBytes } from 'node:crypto';
import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

type Json = { type?: string; attrs?: Record<string, unknown>; content?: Json[] };

/** Gives every step of a stored write-up an id, so comments can point at a step that moves. */
function withStepIds(doc: Json): { doc: Json; changed: boolean } {
  let changed = false;
  const seen = new Set<string>();
  const walk = (n: Json): Json => {
    if (n.type === 'step') {
      const id = n.attrs?.id;
      if (typeof id !== 'string' || seen.has(id)) {
        changed = true;
        const fresh = `s${randomBytes(6).toString('hex')}`;
        seen.add(fresh);
        return { ...n, attrs: { ...n.attrs, id: fresh } };
      }
      seen.add(id);
    }
    return n.content ? { ...n, content: n.content.map(walk) } : n;
  };
  return { doc: walk(doc), changed };
}

/**
 * Review (DESIGN.md T2): comments kept apart from the write-up (so commenting never bumps its
 * version nor causes a save conflict), the history of every state move, and each person's
 * per-studio choice of which e-mails they do not want. Steps of existing write-ups get ids,
 * which comments anchor to.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('comments', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' },
    // A reply's thread; null for the comment that starts one.
    parent_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    // { stepId } | { stepId, quote } | { pieceId } | { stillId }; null for the whole tutorial.
    anchor: { type: DataTypes.JSONB, allowNull: true },
    // What the anchor was called when the comment was made, so a deleted one can still be named.
    anchor_label: { type: DataTypes.TEXT, allowNull: true },
    mentioned_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    resolved_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    edited_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('comments', ['tutorial_id', 'created_at']);
  await qi.addIndex('comments', ['parent_id']);

  await qi.createTable('state_changes', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    tutorial_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' },
    // Null when the app itself made the move (a scheduled publish) or the person was removed.
    by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.TEXT, allowNull: false },
    from_state: { type: DataTypes.TEXT, allowNull: false },
    to_state: { type: DataTypes.TEXT, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    // The comments still open at a send-back, as they read then.
    open_comments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await qi.addIndex('state_changes', ['tutorial_id', 'created_at']);

  await qi.createTable('mail_opt_outs', {
    user_id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    studio_id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, references: { model: 'studios', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.TEXT, primaryKey: true, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });

  const rows = await qi.sequelize.query<{ tutorial_id: string; doc: Json }>('SELECT tutorial_id, doc FROM articles', { type: QueryTypes.SELECT });
  for (const row of rows) {
    const { doc, changed } = withStepIds(row.doc);
    if (changed)
      await qi.sequelize.query('UPDATE articles SET doc = :doc WHERE tutorial_id = :id', { replacements: { doc: JSON.stringify(doc), id: row.tutorial_id } });
  }
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('mail_opt_outs');
  await qi.dropTable('state_changes');
  await qi.dropTable('comments');
}
