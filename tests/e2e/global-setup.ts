import { prepareTestDatabase } from '../harness/prepare-db';

/** Serves the built client and the API on E2E_PORT, with the fake SMTP server beside it. */
export default async function setup() {
  await prepareTestDatabase();
  const port = Number(process.env.PORT ?? 3999);
  process.env.PUBLIC_URL = `http://127.0.0.1:${port}`;
  const { startFakeSmtp } = await import('../../server/fakes/smtp');
  const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
  const { startServer } = await import('../../server/index');
  const app = await startServer({ port });
  return async () => {
    await app.stop();
    await smtp.close();
  };
}
