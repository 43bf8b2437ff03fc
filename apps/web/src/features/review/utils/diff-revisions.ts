import type { RevisionView } from '../api/revision-view';

type Peak = readonly [mz: number, relIntensity: number];

/** One compared field: its label and both values as text (`null` when the revision has none). */
export type FieldDiff = {
  field: string;
  label: string;
  before: string | null;
  after: string | null;
  changed: boolean;
};

export type PeakChange = { mz: number; beforeRelIntensity: number; afterRelIntensity: number };

export type PeakDiff = {
  added: Peak[];
  removed: Peak[];
  changed: PeakChange[];
};

export type RevisionDiff = { fields: FieldDiff[]; peaks: PeakDiff };

type Comparable = Pick<
  RevisionView,
  'name' | 'synonyms' | 'formula' | 'structure' | 'structureFormat' | 'casRn' | 'conditions' | 'retentionIndex' | 'sampleNotes' | 'peaks'
>;

function structureText(revision: Comparable): string | null {
  if (revision.structure === null || revision.structure.trim() === '') return null;
  if (revision.structureFormat === 'molfile') {
    return `molfile, ${revision.structure.split(/\r?\n/).length} lines`;
  }
  return revision.structure;
}

function present(value: string | number | undefined | null, unit = ''): string | null {
  if (value === undefined || value === null || value === '') return null;
  return `${value}${unit}`;
}

/** The fields of a revision in the order the diff table lists them. */
function fieldTexts(revision: Comparable): Array<[field: string, label: string, text: string | null, raw: string | null]> {
  const { conditions, retentionIndex } = revision;
  const scan = conditions.scanRange ? `m/z ${conditions.scanRange.fromMz}–${conditions.scanRange.toMz}` : null;
  const ri = retentionIndex ? `${retentionIndex.value} (${retentionIndex.column})` : null;
  const synonyms = revision.synonyms.length > 0 ? revision.synonyms.join('; ') : null;
  return [
    ['name', 'Name', revision.name, revision.name],
    ['synonyms', 'Synonyms', synonyms, synonyms],
    ['formula', 'Formula', revision.formula, revision.formula],
    // The whole structure is compared, though a molfile is shown only by its size.
    ['structure', 'Structure', structureText(revision), revision.structure],
    ['casRn', 'CAS RN', revision.casRn, revision.casRn],
    ['ionizationEnergyEv', 'Ionization energy', present(conditions.ionizationEnergyEv, ' eV'), present(conditions.ionizationEnergyEv)],
    ['instrumentType', 'Instrument', present(conditions.instrumentType), present(conditions.instrumentType)],
    ['inlet', 'Inlet', present(conditions.inlet), present(conditions.inlet)],
    ['sourceTemperatureC', 'Source temperature', present(conditions.sourceTemperatureC, ' °C'), present(conditions.sourceTemperatureC)],
    ['column', 'Column', present(conditions.column), present(conditions.column)],
    ['scanRange', 'Scan range', scan, scan],
    ['retentionIndex', 'Retention index', ri, ri],
    ['sampleNotes', 'Sample notes', present(revision.sampleNotes), present(revision.sampleNotes)],
  ];
}

/** Intensities are shown to one decimal on the 0–100 scale; smaller differences are not changes. */
const roundRel = (value: number) => Math.round(value * 10) / 10;

/** Peaks matched by m/z: present only in the new revision, only in the old one, or at another height. */
export function diffPeaks(after: readonly Peak[], before: readonly Peak[]): PeakDiff {
  const beforeByMz = new Map(before.map(([mz, rel]) => [mz, rel]));
  const afterByMz = new Map(after.map(([mz, rel]) => [mz, rel]));
  const added: Peak[] = [];
  const changed: PeakChange[] = [];
  for (const [mz, rel] of afterByMz) {
    const old = beforeByMz.get(mz);
    if (old === undefined) added.push([mz, rel]);
    else if (roundRel(old) !== roundRel(rel)) changed.push({ mz, beforeRelIntensity: old, afterRelIntensity: rel });
  }
  const removed: Peak[] = [...beforeByMz].filter(([mz]) => !afterByMz.has(mz)).map(([mz, rel]) => [mz, rel] as const);
  const byMz = (a: Peak, b: Peak) => a[0] - b[0];
  return { added: added.sort(byMz), removed: removed.sort(byMz), changed: changed.sort((a, b) => a.mz - b.mz) };
}

/**
 * What a revision changes against the published one: every field side by side (marked when it differs)
 * and the peaks added, removed or changed. Without a published revision, every field counts as new.
 */
export function diffRevisions(after: Comparable, before: Comparable | null): RevisionDiff {
  const afterFields = fieldTexts(after);
  const beforeFields = before ? fieldTexts(before) : null;
  const fields = afterFields.map(([field, label, text, raw], index): FieldDiff => {
    const old = beforeFields?.[index];
    return {
      field,
      label,
      after: text,
      before: old ? old[2] : null,
      changed: old ? old[3] !== raw : raw !== null,
    };
  });
  return { fields, peaks: diffPeaks(after.peaks, before?.peaks ?? []) };
}
