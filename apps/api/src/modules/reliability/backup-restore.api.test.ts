import { mkdtemp, rm, stat, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../db/data-source';
import { createTestContext, signInAs } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { publishEntry } from '../../testing/curation';
import { createScratchDatabase, type ScratchDatabase } from './scratch-database';
import { REPO_ROOT, runScript } from './run-script';
import { listTables, snapshotTables } from './table-snapshot';

const W = { 'X-Requested-With': 'ionfolio' };

let db: ScratchDatabase;
let dir: string;
beforeAll(async () => {
  db = await createScratchDatabase('ionfolio_backup');
  dir = await mkdtemp(path.join(os.tmpdir(), 'ionfolio-backup-'));
});
afterAll(async () => {
  await db?.drop();
  if (dir) await rm(dir, { recursive: true, force: true });
});

async function withDataSource<T>(url: string, work: (ds: ReturnType<typeof createDataSource>) => Promise<T>): Promise<T> {
  const ds = createDataSource(url);
  await ds.initialize();
  try {
    return await work(ds);
  } finally {
    await ds.destroy();
  }
}

/** Writes through the real app: an entry published with a comment, a role change, a frozen edition. */
async function writeLibrary(url: string, editionLabel: string): Promise<string> {
  const ctx = await createTestContext({ DATABASE_URL: url });
  try {
    const admin = await signInAs(ctx, 'admin');
    const author = await signInAs(ctx, 'contributor');
    const curator = await signInAs(ctx, 'curator');
    const reader = await signInAs(ctx, 'reader');
    const { accession, id } = await publishEntry(author.agent, curator.agent, chlorobenzeneContent());
    await author.agent.post(`/api/v1/revisions/${id}/comments`).set(W).send({ body: 'Kept for the record.' }).expect(201);
    await admin.agent.patch(`/api/v1/admin/users/${reader.id}`).set(W).send({ role: 'contributor' }).expect(200);
    await curator.agent.post('/api/v1/editions').set(W).send({ label: editionLabel, notes: 'Written before a backup' }).expect(201);
    return accession;
  } finally {
    await ctx.close();
  }
}

describe('npm run db:backup and db:restore', () => {
  it('back up, destroy, restore: every table comes back row for row', async () => {
    const accession = await writeLibrary(db.url, 'backup-1');
    const before = await withDataSource(db.url, snapshotTables);
    // The snapshot must hold what was written, or the comparison below would prove nothing.
    expect(JSON.stringify(before.entries)).toContain(accession);
    expect((before.users as unknown[]).length).toBeGreaterThanOrEqual(4);
    expect((before.editions as unknown[]).length).toBe(1);
    expect((before.session as unknown[]).length).toBeGreaterThanOrEqual(4);

    const file = path.join(dir, 'library.dump');
    const backup = await runScript('db-backup.sh', ['--out', file], { DATABASE_URL: db.url });
    expect(backup.stderr).toBe('');
    expect(backup.code).toBe(0);
    expect(backup.stdout).toContain(file);
    const { size } = await stat(file);
    console.log(`backup: ${size} bytes of ${Object.keys(before).length} tables and sequences in ${backup.elapsedMs.toFixed(0)} ms`);

    // Destroy: the whole schema goes, with every table, trigger, function and extension in it.
    await withDataSource(db.url, async (ds) => {
      await ds.query('DROP SCHEMA public CASCADE');
      await ds.query('CREATE SCHEMA public');
      expect(await listTables(ds)).toEqual([]);
    });

    const restore = await runScript('db-restore.sh', [file], { DATABASE_URL: db.url });
    expect(restore.code, restore.stderr).toBe(0);
    expect(restore.stdout).toMatch(/replaces every table/);
    console.log(`restore into an empty schema: ${restore.elapsedMs.toFixed(0)} ms`);
    const after = await withDataSource(db.url, snapshotTables);
    expect(Object.keys(after)).toEqual(Object.keys(before));
    for (const table of Object.keys(before)) expect(after[table], table).toEqual(before[table]);

    // Restored over a database that moved on: the newer rows go, the backup's come back.
    await writeLibrary(db.url, 'backup-2');
    const moved = await withDataSource(db.url, snapshotTables);
    expect(moved.entries).not.toEqual(before.entries);
    const again = await runScript('db-restore.sh', [file], { DATABASE_URL: db.url });
    expect(again.code, again.stderr).toBe(0);
    expect(await withDataSource(db.url, snapshotTables)).toEqual(before);

    // The guards of the schema came back too: published revisions and the audit stay append-only.
    await withDataSource(db.url, async (ds) => {
      await expect(ds.query(`DELETE FROM audit_events`)).rejects.toThrow(/append-only/);
    });
  }, 60_000);

  it('db:restore refuses to run without a file, or with a file that is not a backup', async () => {
    const none = await runScript('db-restore.sh', [], { DATABASE_URL: db.url });
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/usage: npm run db:restore -- FILE/);
    const missing = await runScript('db-restore.sh', [path.join(dir, 'nope.dump')], { DATABASE_URL: db.url });
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/no such backup file/);
    const junk = path.join(dir, 'junk.dump');
    await writeFile(junk, 'not an archive');
    const bad = await runScript('db-restore.sh', [junk], { DATABASE_URL: db.url });
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/not a pg_dump custom-format archive/);
  });

  it('db:backup without --out writes backups/ionfolio-<UTC time>.dump', async () => {
    const res = await runScript('db-backup.sh', [], { DATABASE_URL: db.url });
    expect(res.code, res.stderr).toBe(0);
    const written = /to (backups\/ionfolio-(\d{8}T\d{6}Z)\.dump)/.exec(res.stdout);
    expect(written?.[1]).toBeDefined();
    const stamp = written![2]!;
    const iso = `${stamp.slice(0, 4)}-${stamp.slice(4, 6)}-${stamp.slice(6, 8)}T${stamp.slice(9, 11)}:${stamp.slice(11, 13)}:${stamp.slice(13, 15)}Z`;
    expect(Math.abs(Date.parse(iso) - Date.now())).toBeLessThan(120_000);
    await rm(path.join(REPO_ROOT, written![1]!));
  });
});
