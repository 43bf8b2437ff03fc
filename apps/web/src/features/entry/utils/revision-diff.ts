import type { PeakList } from '@ionfolio/chem';
import type { EntryRevision } from '../api/entry-view';

/** One compared field: its name and its text in each revision. */
export type FieldDiff = { field: string; before: string; after: string; changed: boolean };

/** A peak present in one or both revisions, by m/z; intensities on the stored 0–100 scale. */
export type PeakChange = { mz: number; before: number | null; after: number | null };

export type PeakDiff = { added: PeakChange[]; removed: PeakChange[]; changed: PeakChange[]; unchangedCount: number };

/**
 * Intensities closer than this (% of base peak) count as the same: stored values carry two decimals
 * and a re-export may round them differently (common practice: ignore rounding noise).
 */
export const PEAK_CHANGE_FLOOR = 0.1;

const orDash = (value: string | number | null | undefined): string => (value === null || value === undefined || value === '' ? '—' : String(value));

function conditionsText(r: EntryRevision): [string, string][] {
  const c = r.conditions;
  return [
    ['Ionization energy', c.ionizationEnergyEv === null || c.ionizationEnergyEv === undefined ? '—' : `${c.ionizationEnergyEv} eV`],
    ['Instrument type', orDash(c.instrumentType)],
    ['Inlet', orDash(c.inlet)],
    ['Source temperature', c.sourceTemperatureC === null || c.sourceTemperatureC === undefined ? '—' : `${c.sourceTemperatureC} °C`],
    ['Column', orDash(c.column)],
    ['Scan range', c.scanRange ? `m/z ${c.scanRange.fromMz}–${c.scanRange.toMz}` : '—'],
  ];
}

function fieldsOf(r: EntryRevision): [string, string][] {
  return [
    ['Name', r.name],
    ['Formula', r.formula],
    ['Structure', r.structure ? `${r.structureFormat ?? 'structure'}: ${r.structure}` : '—'],
    ['CAS RN', orDash(r.casRn)],
    ...conditionsText(r),
    ['Retention index', r.retentionIndex ? `${r.retentionIndex.value} (${r.retentionIndex.column} column)` : '—'],
    ['Sample notes', orDash(r.sampleNotes)],
    ['Change note', orDash(r.changeNote)],
  ];
}

/** Field by field, from `before` to `after`, in the order the entry page shows them. */
export function diffRevisionFields(before: EntryRevision, after: EntryRevision): FieldDiff[] {
  const afterFields = new Map(fieldsOf(after));
  return fieldsOf(before).map(([field, text]) => {
    const next = afterFields.get(field) ?? '—';
    return { field, before: text, after: next, changed: text !== next };
  });
}

/** Peaks by m/z (as stored, to 0.01): added in `after`, removed from `before`, or with a changed intensity. */
export function diffPeaks(before: PeakList, after: PeakList): PeakDiff {
  const key = (mz: number) => Math.round(mz * 100) / 100;
  const was = new Map(before.map(([mz, intensity]) => [key(mz), intensity]));
  const now = new Map(after.map(([mz, intensity]) => [key(mz), intensity]));
  const diff: PeakDiff = { added: [], removed: [], changed: [], unchangedCount: 0 };
  for (const mz of [...new Set([...was.keys(), ...now.keys()])].sort((a, b) => a - b)) {
    const b = was.get(mz) ?? null;
    const a = now.get(mz) ?? null;
    if (b === null) diff.added.push({ mz, before: null, after: a });
    else if (a === null) diff.removed.push({ mz, before: b, after: null });
    else if (Math.abs(a - b) >= PEAK_CHANGE_FLOOR) diff.changed.push({ mz, before: b, after: a });
    else diff.unchangedCount += 1;
  }
  return diff;
}
