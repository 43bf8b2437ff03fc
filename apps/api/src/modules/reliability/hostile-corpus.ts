import { readFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { REPO_ROOT } from './run-script';

export const HOSTILE_DIR = path.join(REPO_ROOT, 'tests/fixtures/hostile');

const HostileCase = z
  .strictObject({
    file: z.string().optional(),
    generate: z.string().optional(),
    /** `METHOD /path`; `:draft` and `:inReview` stand for revision ids the test makes. */
    route: z.string().regex(/^(POST|PATCH) \/api\/v1\//),
    /** upload: multipart field `file`; json: the bytes as application/json; text: as text/plain. */
    send: z.enum(['upload', 'json', 'text']),
    status: z.number().int().min(400).max(499),
    code: z.string().nullable(),
    /** Text the error message must contain: it names the problem. */
    message: z.string(),
    why: z.string().min(3),
  })
  .refine((c) => (c.file === undefined) !== (c.generate === undefined), 'give file or generate');
export type HostileCase = z.infer<typeof HostileCase>;

/** The table in tests/fixtures/hostile/corpus.json: which input goes to which route, and what must come back. */
export function loadHostileCorpus(): HostileCase[] {
  return z.array(HostileCase).parse(JSON.parse(readFileSync(path.join(HOSTILE_DIR, 'corpus.json'), 'utf8')));
}

// Inputs too large to keep in git, made the same way on every run.
const GENERATED: Record<string, () => string> = {
  'peaks-100k.txt': () => Array.from({ length: 100_000 }, (_, i) => `${(40 + i * 0.01).toFixed(2)} ${(i % 100) + 1}`).join('\n'),
  'entry-100k-peaks.json': () =>
    JSON.stringify({ name: 'Many peaks (test)', formula: 'C3H6O', peaks: Array.from({ length: 100_000 }, (_, i) => [40 + i * 0.01, (i % 100) + 1]) }),
  'entry-deeply-nested.json': () => `{"name": "Nested (test)", "formula": "C3H6O", "peaks": ${'['.repeat(100_000)}${']'.repeat(100_000)}}`,
  'entry-3mb.json': () => JSON.stringify({ name: 'Big (test)', formula: 'C3H6O', peaks: [[43, 100]], sampleNotes: 'x'.repeat(3 * 1024 * 1024) }),
  'structure-huge.json': () => JSON.stringify({ structure: 'C'.repeat(300_000), format: 'smiles' }),
};

/** The bytes of a case and the file name it is sent under. */
export function hostileInput(c: HostileCase): { name: string; bytes: Buffer } {
  if (c.file !== undefined) return { name: c.file, bytes: readFileSync(path.join(HOSTILE_DIR, c.file)) };
  const make = GENERATED[c.generate ?? ''];
  if (!make) throw new Error(`no generator for ${c.generate}`);
  return { name: c.generate!, bytes: Buffer.from(make()) };
}

/** A corpus file by name. */
export const hostileFile = (name: string): Buffer => readFileSync(path.join(HOSTILE_DIR, name));
