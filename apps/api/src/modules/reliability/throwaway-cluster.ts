import { execFile } from 'node:child_process';
import { chown, mkdtemp, rm } from 'node:fs/promises';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { REPO_ROOT } from './run-script';

const run = promisify(execFile);

export interface ThrowawayCluster {
  port: number;
  /** postgres:// URL of the cluster's `ionfolio` database. */
  url: string;
  stop(): Promise<void>;
  start(): Promise<void>;
  /** Stops the cluster and deletes its folder. */
  destroy(): Promise<void>;
}

/** The PostgreSQL binaries the project scripts use (pg_find_bindir in scripts/lib/pg.sh). */
async function findBinDir(): Promise<string> {
  const { stdout } = await run('bash', ['-c', 'source scripts/lib/pg.sh && pg_find_bindir'], { cwd: REPO_ROOT });
  return stdout.trim();
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** Runs a server binary as the postgres user when we are root, as pg.sh does (initdb refuses root). */
function asOwner(binary: string, args: string[]) {
  const isRoot = process.getuid?.() === 0;
  return isRoot ? run('runuser', ['-u', 'postgres', '--', binary, ...args]) : run(binary, args);
}

/**
 * A PostgreSQL cluster of its own in a temporary folder on a free loopback port, for a test that
 * stops and starts the server. It never touches the shared development and test clusters.
 */
export async function createThrowawayCluster(): Promise<ThrowawayCluster> {
  const bin = await findBinDir();
  const dir = await mkdtemp(path.join(os.tmpdir(), 'ionfolio-pg-'));
  if (process.getuid?.() === 0) {
    const { stdout } = await run('id', ['-u', 'postgres']);
    await chown(dir, Number(stdout.trim()), -1);
  }
  const data = path.join(dir, 'data');
  await asOwner(path.join(bin, 'initdb'), ['-D', data, '-A', 'trust', '-U', 'ionfolio', '-E', 'UTF8', '--locale=C']);
  const port = await freePort();
  const options = `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off`;
  const pgCtl = path.join(bin, 'pg_ctl');
  const start = async () => {
    await asOwner(pgCtl, ['-D', data, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', '-o', options, 'start']);
  };
  const stop = async () => {
    await asOwner(pgCtl, ['-D', data, '-m', 'fast', '-w', 'stop']);
  };
  await start();
  const admin = new pg.Client({ connectionString: `postgres://ionfolio@127.0.0.1:${port}/postgres` });
  await admin.connect();
  await admin.query('CREATE DATABASE ionfolio');
  await admin.end();
  return {
    port,
    url: `postgres://ionfolio@127.0.0.1:${port}/ionfolio`,
    start,
    stop,
    async destroy() {
      await stop().catch(() => undefined);
      await rm(dir, { recursive: true, force: true });
    },
  };
}
