import { createHash } from 'node:crypto';
import {
  checkRevision,
  formatFormula,
  monoisotopicMass,
  nominalMass,
  normalizeSpectrum,
  parseFormula,
  type CheckResult,
} from '@ionfolio/chem';
import type { RevisionContent } from '@ionfolio/contracts';
import type { RevisionRow } from './revision.entity';

export type RevisionContentColumns = Pick<
  RevisionRow,
  | 'name'
  | 'synonyms'
  | 'formula'
  | 'nominalMass'
  | 'monoisotopicMass'
  | 'structure'
  | 'structureFormat'
  | 'casRn'
  | 'peaks'
  | 'peakCount'
  | 'basePeakMz'
  | 'conditions'
  | 'retentionIndex'
  | 'retentionIndexColumn'
  | 'sampleNotes'
  | 'changeNote'
  | 'checks'
  | 'checksWorst'
  | 'contentSha256'
>;

const WORST: Record<CheckResult['status'], number> = { pass: 0, warn: 1, fail: 2 };

/** A stable fingerprint of what a revision says, so anyone can verify it was never changed. */
export function contentSha256(c: RevisionContent): string {
  const canonical = JSON.stringify([
    c.name,
    c.synonyms,
    c.formula,
    c.structure,
    c.structureFormat,
    c.casRn,
    c.peaks,
    Object.entries(c.conditions).sort(([a], [b]) => a.localeCompare(b)),
    c.retentionIndex,
    c.sampleNotes,
    c.changeNote,
  ]);
  return createHash('sha256').update(canonical).digest('hex');
}

/**
 * Turns what a contributor wrote into the stored columns: the formula in Hill order, masses, the
 * spectrum sorted with base peak 100, and the consistency checks of packages/chem.
 */
export function toContentColumns(input: RevisionContent): RevisionContentColumns {
  const formula = formatFormula(parseFormula(input.formula));
  const peaks = normalizeSpectrum(input.peaks, { mzRounding: 'none' }).map(([mz, i]) => [mz, Math.round(i * 100) / 100] as [number, number]);
  const content: RevisionContent = { ...input, formula, peaks };
  const checks = checkRevision({ formula, peaks, ionizationEnergyEv: input.conditions.ionizationEnergyEv });
  const worst = checks.reduce<CheckResult['status']>((w, c) => (WORST[c.status] > WORST[w] ? c.status : w), 'pass');
  const base = peaks.reduce((b, p) => (p[1] > b[1] ? p : b), peaks[0]!);
  return {
    name: input.name,
    synonyms: input.synonyms,
    formula,
    nominalMass: nominalMass(formula),
    monoisotopicMass: monoisotopicMass(formula),
    structure: input.structure,
    structureFormat: input.structureFormat,
    casRn: input.casRn,
    peaks,
    peakCount: peaks.length,
    basePeakMz: base[0],
    conditions: input.conditions,
    retentionIndex: input.retentionIndex?.value ?? null,
    retentionIndexColumn: input.retentionIndex?.column ?? null,
    sampleNotes: input.sampleNotes,
    changeNote: input.changeNote,
    checks,
    checksWorst: worst,
    contentSha256: contentSha256(content),
  };
}

/** The contributor-facing content of a stored revision (the inverse of toContentColumns). */
export function toContent(r: RevisionRow): RevisionContent {
  return {
    name: r.name,
    synonyms: r.synonyms,
    formula: r.formula,
    structure: r.structure,
    structureFormat: r.structureFormat,
    casRn: r.casRn,
    peaks: r.peaks,
    conditions: r.conditions as RevisionContent['conditions'],
    retentionIndex:
      r.retentionIndex === null ? null : { value: r.retentionIndex, column: r.retentionIndexColumn as 'non-polar' },
    sampleNotes: r.sampleNotes,
    changeNote: r.changeNote,
  };
}
