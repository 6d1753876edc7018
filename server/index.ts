import { createServer, type Server } from 'node:http';
import { config } from './config';
import { sequelize } from './models';
import { createApp } from './app';
import { startWorkers, stopQueue } from './jobs';
import { warmSheetPlans } from './services/sheet-plan';

/** Boots the database connection and the HTTP server; resolves once it listens. */
export async function startServer(opts: { port?: number } = {}): Promise<{ server: Server; stop: () => Promise<void> }> {
  await sequelize.authenticate();
  if (config.env === 'production' && !process.env.SESSION_SECRET) {
    console.warn('SESSION_SECRET is not set: sessions are signed with the development secret. Set it before serving real people.');
  }
  const app = createApp();
  const server = createServer(app);
  server.requestTimeout = 0; // multi-GB uploads take longer than Node's default five minutes
  // Workers run in the app process by default; WORKERS=off leaves ffmpeg to other machines.
  if (config.workersInProcess) await startWorkers();
  warmSheetPlans();
  const port = opts.port ?? config.port;
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, config.host, resolve);
  });
  const stop = async () => {
    server.close();
    server.closeAllConnections();
    await stopQueue();
    await app.close();
    await sequelize.close();
  };
  return { server, stop };
}
