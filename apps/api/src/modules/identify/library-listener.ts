import pg from 'pg';
import type { Logger } from 'pino';
import { z } from 'zod';

/** The channel on which publishing and withdrawing announce a change (inside their transaction). */
export const LIBRARY_CHANNEL = 'ionfolio_library';

const LibraryChange = z.object({ accession: z.string(), change: z.string() });
export type LibraryChange = z.infer<typeof LibraryChange>;

export interface LibraryListener {
  stop(): Promise<void>;
}

/**
 * LISTENs on {@link LIBRARY_CHANNEL} with a dedicated connection (a pooled one could be handed to
 * someone else and lose the LISTEN). When the connection drops it reconnects with a growing delay
 * (0.5 s doubling to 30 s) and then calls `onConnected` again, because notifications sent while it was
 * away are lost: the caller reloads from PostgreSQL, the source of truth.
 */
export function listenForLibraryChanges(options: {
  databaseUrl: string;
  logger: Logger;
  onChange: (change: LibraryChange) => void;
  onConnected: (firstTime: boolean) => Promise<void>;
}): { listener: LibraryListener; connected: Promise<void> } {
  const { databaseUrl, logger, onChange, onConnected } = options;
  let client: pg.Client | undefined;
  let stopped = false;
  let delayMs = 500;
  let timer: NodeJS.Timeout | undefined;
  let firstTime = true;

  async function connect(): Promise<void> {
    const c = new pg.Client({ connectionString: databaseUrl, application_name: 'ionfolio-library-listener' });
    c.on('notification', (msg) => {
      if (msg.channel !== LIBRARY_CHANNEL || msg.payload === undefined) return;
      let parsed: unknown;
      try {
        parsed = JSON.parse(msg.payload);
      } catch {
        parsed = undefined;
      }
      const change = LibraryChange.safeParse(parsed);
      if (change.success) onChange(change.data);
      else logger.warn({ payload: msg.payload }, 'ignored a library notification that is not { accession, change }');
    });
    c.on('error', (err) => {
      logger.warn({ err }, 'library listener connection failed');
      reconnectSoon(c);
    });
    c.on('end', () => reconnectSoon(c));
    client = c;
    await c.connect();
    await c.query(`LISTEN ${LIBRARY_CHANNEL}`);
    delayMs = 500;
    const wasFirst = firstTime;
    firstTime = false;
    await onConnected(wasFirst);
  }

  function reconnectSoon(c: pg.Client): void {
    if (stopped || client !== c || timer) return;
    client = undefined;
    c.removeAllListeners();
    c.on('error', () => undefined);
    void c.end().catch(() => undefined);
    timer = setTimeout(() => {
      timer = undefined;
      connect().catch((err: unknown) => {
        logger.warn({ err, retryInMs: delayMs }, 'library listener could not reconnect');
        if (client) reconnectSoon(client);
      });
    }, delayMs);
    delayMs = Math.min(delayMs * 2, 30_000);
  }

  const connected = connect().catch((err: unknown) => {
    if (client) reconnectSoon(client);
    throw err;
  });
  return {
    connected,
    listener: {
      async stop() {
        stopped = true;
        if (timer) clearTimeout(timer);
        const c = client;
        client = undefined;
        if (c) {
          c.removeAllListeners();
          c.on('error', () => undefined);
          await c.end().catch(() => undefined);
        }
      },
    },
  };
}
