import { randomUUID } from 'node:crypto';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import pg from 'pg';

const addresses = (a: AddressObject | AddressObject[] | undefined) => (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

/**
 * A local SMTP server on loopback that keeps every message it receives in outbox_messages, with
 * its envelope recipients, so each person can follow their own reset and invitation links without
 * a real mail service.
 */
export async function startFakeSmtp(opts: { port: number; databaseUrl: string; host?: string }) {
  const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 2 });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 30 * 1024 * 1024,
    onData(stream, session, callback) {
      // Who it was delivered to (the envelope, Bcc included), not what the To header claims.
      const recipients = [...new Set(session.envelope.rcptTo.map((r) => r.address.trim().toLowerCase()))];
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      new Promise<Buffer>((resolve, reject) => {
        stream.on('end', () => resolve(Buffer.concat(chunks)));
        stream.on('error', reject);
      })
        .then(async (raw) => {
          const m = await simpleParser(raw);
          const attachments = m.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, size: a.size }));
          await pool.query(
            `INSERT INTO outbox_messages (id, message_id, "from", "to", recipients, subject, text, html, attachments, raw, created_at, updated_at)
             VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,$10,now(),now())`,
            [
              randomUUID(),
              m.messageId ?? null,
              addresses(m.from),
              addresses(m.to),
              recipients,
              m.subject ?? '',
              m.text ?? '',
              m.html || null,
              JSON.stringify(attachments),
              raw.toString('utf8'),
            ],
          );
          callback();
        })
        .catch((e) => callback(e));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, opts.host ?? '127.0.0.1', () => resolve());
  });
  return {
    port: opts.port,
    async close() {
      await new Promise<void>((r) => server.close(() => r()));
      await pool.end();
    },
  };
}
