import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const ref = (table: string, onDelete: 'CASCADE' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

/** People, studios, roles, invitations, password resets, sessions and the fake mailbox. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.TEXT, allowNull: false, unique: true },
    name: { type: DataTypes.TEXT, allowNull: false },
    password_hash: { type: DataTypes.TEXT, allowNull: false },
    ...stamps,
  });
  await qi.createTable('studios', {
    id,
    name: { type: DataTypes.TEXT, allowNull: false },
    slug: { type: DataTypes.TEXT, allowNull: false, unique: true },
    ...stamps,
  });
  await qi.createTable('memberships', {
    id,
    studio_id: ref('studios'),
    user_id: ref('users'),
    role: { type: DataTypes.TEXT, allowNull: false },
    ...stamps,
  });
  await qi.addConstraint('memberships', { fields: ['studio_id', 'user_id'], type: 'unique', name: 'memberships_studio_user' });
  await qi.sequelize.query(`ALTER TABLE memberships ADD CONSTRAINT memberships_role CHECK (role IN ('owner','coordinator','maker','student'))`);
  await qi.createTable('invitations', {
    id,
    studio_id: ref('studios'),
    email: { type: DataTypes.TEXT, allowNull: false },
    role: { type: DataTypes.TEXT, allowNull: false },
    token_hash: { type: DataTypes.TEXT, allowNull: false, unique: true },
    invited_by_id: ref('users', 'SET NULL', true),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.createTable('password_resets', {
    id,
    user_id: ref('users'),
    token_hash: { type: DataTypes.TEXT, allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.createTable('outbox_messages', {
    id,
    message_id: { type: DataTypes.TEXT, allowNull: true },
    from: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    to: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    subject: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    text: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    html: { type: DataTypes.TEXT, allowNull: true },
    attachments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    ...stamps,
  });
  // The table connect-pg-simple expects, made here so the app never creates tables at run time.
  await qi.sequelize.query(`
    CREATE TABLE "session" ("sid" varchar NOT NULL PRIMARY KEY, "sess" json NOT NULL, "expire" timestamp(6) NOT NULL);
    CREATE INDEX "session_expire" ON "session" ("expire");`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['session', 'outbox_messages', 'password_resets', 'invitations', 'memberships', 'studios', 'users']) await qi.dropTable(t);
}
