import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Who a caught message was delivered to (the SMTP envelope's recipients, lower case), so a person's
 * Outbox lists only their own mail. Older rows take the addresses found in their To header.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('outbox_messages', 'recipients', { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] });
  await qi.sequelize.query(`
    UPDATE outbox_messages SET recipients = ARRAY(
      SELECT DISTINCT lower(m[1]) FROM regexp_matches("to", '([^\\s<>,;"]+@[^\\s<>,;"]+)', 'g') AS m
    )`);
  await qi.sequelize.query('CREATE INDEX outbox_messages_recipients ON outbox_messages USING GIN (recipients)');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('outbox_messages', 'recipients');
}
