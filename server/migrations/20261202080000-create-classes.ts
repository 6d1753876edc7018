import { DataTypes, type QueryInterface } from 'sequelize';

const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/**
 * Classes taught from a tutorial, their registrations (seat holds, payments, the waiting list),
 * the payment provider's webhook events already handled (so a repeat changes nothing), and a
 * price per stock sheet on each material for the kit planner.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('classes', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    studio_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'studios', key: 'id' }, onDelete: 'CASCADE' },
    tutorial_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'tutorials', key: 'id' }, onDelete: 'CASCADE' },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.TEXT, allowNull: false },
    starts_at: { type: DataTypes.DATE, allowNull: false },
    time_zone: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'UTC' },
    duration_minutes: { type: DataTypes.INTEGER, allowNull: false },
    place: { type: DataTypes.TEXT, allowNull: false },
    seats: { type: DataTypes.INTEGER, allowNull: false },
    spares: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    kit_fee_cents: { type: DataTypes.INTEGER, allowNull: false },
    currency: { type: DataTypes.TEXT, allowNull: false },
    what_to_bring: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    cancellation_deadline: { type: DataTypes.DATE, allowNull: true },
    cautions: { type: DataTypes.TEXT, allowNull: true },
    paper: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'letter' },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'scheduled' },
    cancelled_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('classes', ['studio_id', 'starts_at']);
  await qi.addIndex('classes', ['tutorial_id']);
  await qi.sequelize.query(`ALTER TABLE classes ADD CONSTRAINT classes_seats CHECK (seats >= 1)`);
  await qi.sequelize.query(`ALTER TABLE classes ADD CONSTRAINT classes_spares CHECK (spares >= 0)`);
  await qi.sequelize.query(`ALTER TABLE classes ADD CONSTRAINT classes_fee CHECK (kit_fee_cents >= 0)`);
  await qi.sequelize.query(`ALTER TABLE classes ADD CONSTRAINT classes_status CHECK (status IN ('scheduled','cancelled'))`);

  await qi.createTable('registrations', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    class_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'classes', key: 'id' }, onDelete: 'CASCADE' },
    // The order people came in: the waiting list is offered seats in this order.
    seq: { type: DataTypes.BIGINT, autoIncrement: true, allowNull: false },
    user_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    name: { type: DataTypes.TEXT, allowNull: false },
    email: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.TEXT, allowNull: false },
    end_reason: { type: DataTypes.TEXT, allowNull: true },
    amount_cents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    currency: { type: DataTypes.TEXT, allowNull: false },
    hold_expires_at: { type: DataTypes.DATE, allowNull: true },
    offered_at: { type: DataTypes.DATE, allowNull: true },
    checkout_session_id: { type: DataTypes.TEXT, allowNull: true, unique: true },
    checkout_url: { type: DataTypes.TEXT, allowNull: true },
    checkout_attempt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    payment_intent_id: { type: DataTypes.TEXT, allowNull: true },
    paid_at: { type: DataTypes.DATE, allowNull: true },
    confirmed_at: { type: DataTypes.DATE, allowNull: true },
    cancelled_at: { type: DataTypes.DATE, allowNull: true },
    refund_id: { type: DataTypes.TEXT, allowNull: true },
    refunded_at: { type: DataTypes.DATE, allowNull: true },
    checked_in_at: { type: DataTypes.DATE, allowNull: true },
    reminder_sent_at: { type: DataTypes.DATE, allowNull: true },
    ...stamps,
  });
  await qi.addIndex('registrations', ['class_id', 'status', 'seq']);
  await qi.addIndex('registrations', ['email']);
  await qi.sequelize.query(
    `ALTER TABLE registrations ADD CONSTRAINT registrations_status CHECK (status IN ('awaiting_payment','confirmed','waitlisted','cancelled','refunded','expired'))`,
  );
  // One live registration per e-mail and class, even when two arrive at the same instant.
  await qi.sequelize.query(
    `CREATE UNIQUE INDEX registrations_one_live_per_email ON registrations (class_id, email) WHERE status IN ('awaiting_payment','confirmed','waitlisted')`,
  );

  await qi.createTable('payment_events', {
    id: { type: DataTypes.TEXT, primaryKey: true, allowNull: false },
    type: { type: DataTypes.TEXT, allowNull: false },
    outcome: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...stamps,
  });

  // The whole message as received, so tests can open attachments (the handout, the calendar file).
  await qi.addColumn('outbox_messages', 'raw', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('materials', 'sheet_price_cents', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addColumn('materials', 'sheet_price_currency', { type: DataTypes.TEXT, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('outbox_messages', 'raw');
  await qi.removeColumn('materials', 'sheet_price_currency');
  await qi.removeColumn('materials', 'sheet_price_cents');
  for (const t of ['payment_events', 'registrations', 'classes']) await qi.dropTable(t);
}
