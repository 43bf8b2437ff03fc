import { parseFormula } from '@ionfolio/chem';
import type { Candidate, Reading } from '../api/identify-schemas';

/**
 * Why a candidate's formula disagrees with the query's molecular-ion check, one sentence per reason;
 * empty when it agrees or when there is nothing to compare (no reading, or M likely absent — then the
 * highest cluster is a fragment and says nothing firm about the molecule).
 */
export function formulaDisagreements(
  candidate: Pick<Candidate, 'formula' | 'nominalMass'>,
  reading: Pick<Reading, 'likelyAbsent' | 'molecularIonMz' | 'chlorine' | 'bromine'> | null,
): string[] {
  if (reading === null || reading.likelyAbsent || reading.molecularIonMz === null) return [];
  const reasons: string[] = [];
  if (candidate.nominalMass !== reading.molecularIonMz) {
    reasons.push(`nominal mass ${candidate.nominalMass}, the query's M reads ${reading.molecularIonMz}`);
  }
  let counts: Partial<Record<string, number>>;
  try {
    counts = parseFormula(candidate.formula);
  } catch {
    return [...reasons, `formula "${candidate.formula}" could not be read`];
  }
  const chlorine = counts.Cl ?? 0;
  const bromine = counts.Br ?? 0;
  if (chlorine !== reading.chlorine) reasons.push(`Cl${chlorine} in the formula, the cluster reads Cl${reading.chlorine}`);
  if (bromine !== reading.bromine) reasons.push(`Br${bromine} in the formula, the cluster reads Br${reading.bromine}`);
  return reasons;
}
