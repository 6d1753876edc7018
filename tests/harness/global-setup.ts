import { prepareTestDatabase } from './prepare-db';

/** API tests: a migrated test database and the fake SMTP, payment and S3 servers on loopback. */
export default async function setup() {
  await prepareTestDatabase();
  const { startFakeSmtp } = await import('../../server/fakes/smtp');
  const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
  // Payments: no webhook endpoint at first; a test that needs webhooks serves its app and adds one (tests/harness/payments.ts).
  const { startFakePayments } = await import('../../server/fakes/payments');
  const { config } = await import('../../server/config');
  const payments = await startFakePayments({ port: Number(process.env.PAYMENTS_PORT), webhookSecret: config.payments.webhookSecret, retries: 4 });
  const { startS3ForTests } = await import('./s3');
  const s3 = await startS3ForTests();
  return async () => {
    await smtp.close();
    await payments.close();
    await s3?.close();
  };
}
