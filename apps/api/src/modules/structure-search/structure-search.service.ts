import type { DataSource } from 'typeorm';
import type { Molecule } from 'openchemlib';
import { AppError } from '../../shared/app-error';
import type { StructureSearchRequest } from './structure-search.schemas';
import { fragmentMatcher, fragmentOf, readStructure, structureKeys } from './structure-keys';

export interface StructureHit {
  accession: string;
  revision: number;
  name: string;
  formula: string;
  nominalMass: number;
  structure: string;
  simulated: boolean;
}

const BATCH = 500;

/**
 * Computes the structure keys that publishing marked as pending (a trigger on revisions sets
 * `pending` when a revision with a structure becomes published; the review service needs no
 * change for it). Each search runs this first; with nothing pending it is one index probe. A
 * structure openchemlib cannot read is stored with its error and never matches.
 */
export async function refreshStructureKeys(ds: DataSource): Promise<number> {
  let done = 0;
  for (;;) {
    const rows: { id: string; structure: string; format: 'smiles' | 'molfile'; sha: string }[] = await ds.query(
      `SELECT r.id, r.structure, r.structure_format AS format, r.content_sha256 AS sha
         FROM structure_keys sk JOIN revisions r ON r.id = sk.revision_id
        WHERE sk.pending AND r.structure IS NOT NULL AND r.structure_format IS NOT NULL
        LIMIT ${BATCH}`,
    );
    if (rows.length === 0) return done;
    const values: unknown[] = [];
    const tuples = rows.map((row, i) => {
      let idcode: string | null = null;
      let bits: string | null = null;
      let error: string | null = null;
      try {
        const keys = structureKeys(readStructure(row.structure, row.format));
        idcode = keys.idcode;
        bits = keys.indexBits;
      } catch (err) {
        error = String((err as Error).message ?? err).slice(0, 500);
      }
      values.push(row.id, row.sha, idcode, bits, error);
      const b = i * 5;
      return `($${b + 1}::uuid, $${b + 2}, $${b + 3}, $${b + 4}::bit(512), $${b + 5})`;
    });
    await ds.query(
      `INSERT INTO structure_keys (revision_id, content_sha256, idcode, ss_index, error) VALUES ${tuples.join(', ')}
       ON CONFLICT (revision_id) DO UPDATE SET content_sha256 = EXCLUDED.content_sha256, idcode = EXCLUDED.idcode,
         ss_index = EXCLUDED.ss_index, error = EXCLUDED.error, computed_at = now(), pending = false`,
      values,
    );
    done += rows.length;
  }
}

type CandidateRow = Omit<StructureHit, never> & { idcode: string; bits: string };

const HIT_COLUMNS = `e.accession, r.number AS revision, r.name, r.formula, r.nominal_mass AS "nominalMass", r.structure, r.simulated,
  sk.idcode, sk.ss_index::text AS bits`;

/**
 * Published entries whose structure contains the fragment (substructure) or is the same molecule
 * (exact: equal openchemlib idcodes), in accession order, at most `limit` (`truncated` says when
 * more would match).
 *
 * Substructure search screens in PostgreSQL first — a revision can only contain the fragment when
 * every bit of the fragment's index is set in its own (`ss_index & f = f`) — and runs
 * openchemlib's atom-by-atom match only on the rows that pass.
 */
export async function searchStructures(ds: DataSource, request: StructureSearchRequest) {
  let query: { fragment: Molecule; index: number[]; indexBits: string };
  try {
    query = fragmentOf(request.smiles);
  } catch (err) {
    const reason = String((err as Error).message ?? err).replace(/^Class\$\S+\s*/, '');
    throw new AppError('UNREADABLE_STRUCTURE', 400, `The SMILES could not be read: ${reason}`, {
      details: [{ path: 'smiles', message: reason, code: 'custom' }],
    });
  }
  const started = performance.now();
  await refreshStructureKeys(ds);
  const from = `FROM structure_keys sk JOIN revisions r ON r.id = sk.revision_id AND r.state = 'published'
    AND r.content_sha256 = sk.content_sha256 JOIN entries e ON e.id = r.entry_id`;

  if (request.mode === 'exact') {
    const idcode = readStructure(request.smiles, 'smiles').getIDCode();
    const rows: CandidateRow[] = await ds.query(
      `SELECT ${HIT_COLUMNS} ${from} WHERE sk.idcode = $1 ORDER BY e.accession LIMIT $2`,
      [idcode, request.limit + 1],
    );
    return answer(rows.slice(0, request.limit), rows.length, rows.length > request.limit, started, request);
  }

  // Candidates are read in structure_keys primary-key order, a batch at a time: the inner query
  // walks that index and stops at the batch size (the planner cannot estimate the bit test, and
  // ordering the joined rows by accession would sort every candidate first). Keys of revisions no
  // longer published are skipped here; the hits are put in accession order at the end.
  const matches = fragmentMatcher(query.fragment, query.index);
  const hits: (CandidateRow & { revisionId: string })[] = [];
  let screened = 0;
  let after = '00000000-0000-0000-0000-000000000000';
  let truncated = false;
  for (;;) {
    const batch: (CandidateRow & { revisionId: string; live: boolean })[] = await ds.query(
      `WITH batch AS (
         SELECT revision_id, content_sha256, idcode, ss_index FROM structure_keys
          WHERE idcode IS NOT NULL AND revision_id > $2::uuid AND (ss_index & $1::bit(512)) = $1::bit(512)
          ORDER BY revision_id LIMIT ${BATCH}
       )
       SELECT e.accession, r.number AS revision, r.name, r.formula, r.nominal_mass AS "nominalMass", r.structure, r.simulated,
              sk.idcode, sk.ss_index::text AS bits, sk.revision_id AS "revisionId",
              (r.state = 'published' AND r.content_sha256 = sk.content_sha256) AS live
         FROM batch sk JOIN revisions r ON r.id = sk.revision_id JOIN entries e ON e.id = r.entry_id
        ORDER BY sk.revision_id`,
      [query.indexBits, after],
    );
    const rows = batch.filter((row) => row.live).map(({ live: _l, ...row }) => row);
    for (const row of rows) {
      screened += 1;
      if (matches(row.idcode, row.bits)) hits.push(row);
      if (hits.length > request.limit) break;
    }
    if (hits.length > request.limit) {
      truncated = true;
      break;
    }
    if (batch.length < BATCH) break;
    after = batch.at(-1)!.revisionId;
  }
  const page = hits.slice(0, request.limit).map(({ revisionId: _r, ...hit }) => hit);
  page.sort((a, b) => (a.accession < b.accession ? -1 : 1));
  return answer(page, screened, truncated, started, request);
}

function answer(rows: CandidateRow[], screened: number, truncated: boolean, started: number, request: StructureSearchRequest) {
  return {
    mode: request.mode,
    smiles: request.smiles,
    entries: rows.map(({ idcode: _i, bits: _b, ...hit }) => hit),
    /** Rows that passed the index screen and were matched atom by atom. */
    screened,
    truncated,
    tookMs: Math.round(performance.now() - started),
  };
}
