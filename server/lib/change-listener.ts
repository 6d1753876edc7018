import pg from 'pg';

/** What one PostgreSQL channel's notifications do in this process. */
export type ChannelHandler = {
  /** A notification's payload ('' when it had none). */
  onNotify: (payload: string) => void;
  /** Called with true once the channel is listened to, and with false when the connection is lost or stopped. */
  onListening: (on: boolean) => void;
};

/**
 * LISTENs on a connection of its own to the channels given and hands each notification to its
 * channel's handler; returns the function that stops it. The in-process caches (public pages, the
 * signed-in person) keep copies only while their channel is listened to: a change made by another
 * process while the connection was down would have been missed, so the handlers forget everything
 * on `onListening` and the listener retries every second.
 */
export function listenForChanges(databaseUrl: string, handlers: Record<string, ChannelHandler>): () => Promise<void> {
  const channels = Object.keys(handlers);
  let client: pg.Client | null = null;
  let stopped = false;
  let retry: NodeJS.Timeout | undefined;
  const tell = (on: boolean) => {
    for (const h of Object.values(handlers)) h.onListening(on);
  };
  const again = () => {
    tell(false);
    if (!stopped) retry = setTimeout(connect, 1000);
  };
  function connect() {
    const c = new pg.Client({ connectionString: databaseUrl });
    c.on('notification', (n) => handlers[n.channel]?.onNotify(n.payload ?? ''));
    c.on('error', () => {
      client = null;
      void c.end().catch(() => {});
      again();
    });
    c.connect()
      .then(() => c.query(channels.map((ch) => `LISTEN ${pg.escapeIdentifier(ch)}`).join('; ')))
      .then(() => {
        if (stopped) return void c.end().catch(() => {});
        client = c;
        tell(true);
      })
      .catch(() => {
        void c.end().catch(() => {});
        again();
      });
  }
  connect();
  return async () => {
    stopped = true;
    clearTimeout(retry);
    tell(false);
    await client?.end().catch(() => {});
  };
}
