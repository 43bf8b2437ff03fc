import { once } from 'node:events';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../../shared/require-role';
import { ListEntriesQuery } from './entries.schemas';
import { allEntries, type EntryListItem } from './entries.list';

const COLUMNS: [string, (e: EntryListItem) => string | number | boolean | null][] = [
  ['accession', (e) => e.accession],
  ['revision', (e) => e.revision],
  ['state', (e) => e.state],
  ['name', (e) => e.name],
  ['synonyms', (e) => e.synonyms.join('; ')],
  ['formula', (e) => e.formula],
  ['nominal_mass_da', (e) => e.nominalMass],
  ['base_peak_mz', (e) => e.basePeakMz],
  ['peak_count', (e) => e.peakCount],
  ['retention_index', (e) => e.retentionIndex],
  ['contributor', (e) => e.authorLogin],
  ['contributor_name', (e) => e.author],
  ['updated_at', (e) => e.updatedAt],
  ['simulated', (e) => e.simulated],
];

/**
 * One CSV cell, always quoted. Text that a spreadsheet would run as a formula (a leading `=`, `+`,
 * `-`, `@`, tab or carriage return) gets a leading apostrophe, the usual defence against CSV injection.
 */
export function csvCell(value: string | number | boolean | null): string {
  if (value === null) return '""';
  let text = String(value);
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return `"${text.replace(/"/g, '""')}"`;
}

/** `GET /entries.csv`: the library list with the same filters as `GET /entries`, every row, streamed. */
export function entriesCsvRoutes(ds: DataSource): Router {
  const r = Router();
  r.get('/entries.csv', requireRole('reader'), async (req, res) => {
    const query = ListEntriesQuery.parse(req.query);
    const rows = allEntries(ds, query);
    // The first batch is read before the headers go out, so a bad edition still answers 404 in JSON.
    const first = await rows.next();
    res.type('text/csv; charset=utf-8').attachment('ionfolio-library.csv');
    res.write(`${COLUMNS.map(([name]) => name).join(',')}\r\n`);
    const write = async (batch: EntryListItem[]) => {
      const text = batch.map((e) => `${COLUMNS.map(([, get]) => csvCell(get(e))).join(',')}\r\n`).join('');
      if (!res.write(text)) await once(res, 'drain');
    };
    if (!first.done) {
      await write(first.value);
      for await (const batch of rows) await write(batch);
    }
    res.end();
  });
  return r;
}
