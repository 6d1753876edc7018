import { prepareTestDatabase } from '../harness/prepare-db';

/** Serves the built client and the API on E2E_PORT, with the fake SMTP and payment servers beside it. */
export default async function setup() {
  await prepareTestDatabase();
  const port = Number(process.env.PORT ?? 3999);
  process.env.PUBLIC_URL = `http://127.0.0.1:${port}`;
  const { startFakeSmtp } = await import('../../server/fakes/smtp');
  const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
  const { startFakePayments } = await import('../../server/fakes/payments');
  const { config } = await import('../../server/config');
  const payments = await startFakePayments({
    port: Number(process.env.PAYMENTS_PORT),
    webhookSecret: config.payments.webhookSecret,
    webhookUrls: [`http://127.0.0.1:${port}/api/payments/webhook`],
  });
  // The demo studio: the accessibility check visits every page of it, as each role sees it.
  const { seedDemo } = await import('../../server/seed');
  await seedDemo();
  const { startServer } = await import('../../server/index');
  const app = await startServer({ port });
  return async () => {
    await app.stop();
    await smtp.close();
    await payments.close();
  };
}
