import {
  heteroatomRatioFailures,
  passesElementProbability,
  passesHcRatio,
  type CountsVector,
} from './golden-rules';

// Module-local copies: imported bindings may compile to getters, and this runs per candidate.
const hcRatioOk = passesHcRatio;
const ratioFailures = heteroatomRatioFailures;
const probabilityOk = passesElementProbability;

/**
 * Natural-log plausibility prior of a formula among candidates of the same nominal mass, used to
 * rank suggestions whose isotope clusters fit equally well (or when no cluster is given). A
 * heuristic of this project, not a published score:
 * - substituents per carbon (H + halogens)/C near 1.6: `−½·((x − 1.6)/0.8)²`;
 * - each Golden Rules soft check failed (H/C, each heteroatom ratio, element probability): −2;
 * - RDBE above 0.75·C + 1 (more unsaturation than polycyclic aromatics): −1 per unit above;
 * - elements that the cluster cannot see cost more (F −2 +0.15/atom, P −3, I −2.5, each per
 *   element present) than those it shows (Si −1.5, S −1, Cl −0.5, Br −0.5); N −0.5 and −0.3 per
 *   atom, O −0.25 per atom.
 */
export function formulaLogPrior(c: CountsVector, rdbeValue: number): number {
  let logPrior = elementLogPrior(c);
  if (c.C > 0) {
    const x = (c.H + c.F + c.Cl + c.Br + c.I) / c.C;
    logPrior -= 0.5 * ((x - 1.6) / 0.8) ** 2;
  } else {
    logPrior -= 8;
  }
  if (!hcRatioOk(c)) logPrior -= 2;
  logPrior -= 2 * ratioFailures(c);
  if (!probabilityOk(c)) logPrior -= 2;
  const rdbeExcess = rdbeValue - (0.75 * c.C + 1);
  if (rdbeExcess > 0) logPrior -= rdbeExcess;
  return logPrior;
}

/**
 * The element terms of {@link formulaLogPrior} alone (≤ 0, never rising with any count), an upper
 * bound of the whole prior that the enumeration uses to skip hopeless branches.
 */
export function elementLogPrior(c: CountsVector): number {
  let logPrior = 0;
  if (c.F > 0) logPrior -= 2 + 0.15 * c.F;
  if (c.P > 0) logPrior -= 3;
  if (c.I > 0) logPrior -= 2.5;
  if (c.Si > 0) logPrior -= 1.5;
  if (c.S > 0) logPrior -= 1;
  if (c.Cl > 0) logPrior -= 0.5;
  if (c.Br > 0) logPrior -= 0.5;
  if (c.N > 0) logPrior -= 0.5 + 0.3 * c.N;
  logPrior -= 0.25 * c.O;
  return logPrior;
}
