import { prepareTestDatabase } from './prepare-db';

/** API tests: a migrated test database and the fake SMTP server on loopback. */
export default async function setup() {
  await prepareTestDatabase();
  const { startFakeSmtp } = await import('../../server/fakes/smtp');
  const smtp = await startFakeSmtp({ port: Number(process.env.SMTP_PORT), databaseUrl: process.env.DATABASE_URL! });
  return async () => smtp.close();
}
