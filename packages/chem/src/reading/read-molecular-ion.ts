import type { ClusterPeak } from '../isotopes/isotope-cluster';
import { normalizeSpectrum } from '../spectrum/normalize-spectrum';
import type { FormulaSuggestion } from '../suggest/suggest-formulas';
import { suggestFormulas } from '../suggest/suggest-formulas';
import type { PeakList } from '../types';
import { carbonRange, type CarbonRange } from './carbon-range';
import { clusterPattern, type HeteroatomHypothesis } from './cluster-model';
import { acceptable, acceptableChiSquare, fitHypothesesAt, type HypothesisFit } from './fit-hypotheses';
import { LEAD_DA, moleculeShare, type NoiseModel } from './fit-cluster';

/** The molecular ion's fitted share must be at least this fraction of its [M−2H]+ share. */
const PLAUSIBLE_M_SHARE = 0.3;
/** Hypotheses whose score is within this Δχ² of the best are rivals worth naming. */
const RIVAL_DELTA = 4;

/** What {@link readMolecularIon} concludes about the molecular ion, with every number behind it. */
export interface MolecularIonReading {
  /** Nominal m/z of M (lightest isotopes), or null when M is likely absent from the spectrum. */
  molecularIonMz: number | null;
  /** Lowest m/z of the highest cluster that is not noise (M when M is present). */
  clusterStartMz: number;
  likelyAbsent: boolean;
  /** The observed cluster from M up (any fitted [M−H]+ / [M−2H]+ share removed), most intense = 100. */
  cluster: ClusterPeak[];
  chlorine: number;
  bromine: number;
  sulfurLikely: boolean;
  siliconLikely: boolean;
  /** Carbon count from M+1 (13C 1.08 %/C, SCIENCE.md §1), or null without a usable M+1. */
  carbonRange: CarbonRange | null;
  /** Parity of the number of nitrogen atoms by the nitrogen rule, null when M is likely absent. */
  nitrogenParity: 'even' | 'odd' | null;
  /** Every number behind each conclusion, as label and value text. */
  evidence: { label: string; value: string }[];
  /** Formulas for M that fit the cluster (empty when M is likely absent or `suggestLimit` is 0). */
  suggestions: FormulaSuggestion[];
  notes: string[];
}

/** Options of {@link readMolecularIon}. */
export interface ReadMolecularIonOptions {
  /** Number of formula suggestions; 0 skips them. Default 5. */
  suggestLimit?: number;
  /** Peaks below this % of the base peak are noise and cannot start a cluster. Default 0.5. */
  minRelIntensity?: number;
  /** Relative intensity noise (fraction of each peak), default 0.05. */
  relativeNoise?: number;
  /** Absolute intensity noise in % of the base peak, default 0.1. */
  absoluteNoise?: number;
}

/** How far below the highest significant peak M may lie: Cl6 spans 12 Da, Br4 8 Da (plus 13C). */
const WINDOW_DA = 14;
function option(value: number | undefined, fallback: number, name: string, max: number): number {
  const result = value ?? fallback;
  if (!Number.isFinite(result) || result < 0 || result > max) throw new RangeError(`${name} must be from 0 to ${max}, got ${String(value)}`);
  return result;
}

function formatHypothesis(h: HeteroatomHypothesis): string {
  const parts = [
    h.chlorine ? `Cl${h.chlorine}` : '',
    h.bromine ? `Br${h.bromine}` : '',
    h.sulfur ? `S${h.sulfur}` : '',
    h.silicon ? `Si${h.silicon}` : '',
  ].filter(Boolean);
  return parts.length ? parts.join(' ') : 'no Cl, Br, S or Si';
}

function percent(value: number): string {
  return `${value.toFixed(1)} %`;
}

/**
 * Reads the molecular ion from an EI spectrum: finds the highest cluster that is not noise,
 * proposes M or says it is likely absent, counts Cl and Br (and says whether S or Si is likely)
 * from the M+2/M+4/… pattern, gives a carbon range from M+1, the nitrogen parity, and formula
 * suggestions — with every number behind each conclusion in `evidence`.
 *
 * Method: every m/z within 14 Da below the highest significant peak is a candidate M; for each,
 * theoretical clusters (isotope table of SCIENCE.md §1) of C_n H_1.5n Cl_a Br_b S_c Si_d
 * (a ≤ 6, b ≤ 4, c ≤ 3, d ≤ 2; n near the M+1 estimate) are fitted by weighted least squares to the
 * observed intensities from M−2 up (the same cluster at M−1 and M−2 with free scales stands for
 * [M−H]+ and [M−2H]+ ions), with σ = relativeNoise × intensity + absoluteNoise; χ² with a
 * small prior cost per S/Si atom picks the hypothesis. M is the lowest candidate whose best fit is
 * acceptable (χ² ≤ dof + 4√(2·dof) + 4). M is likely absent when no candidate fits, or when a
 * peak at M−4 … M−12 (losses that rarely occur; common practice) is at least as intense as M.
 *
 * @param peaks - any peak list (not changed); m/z are rounded to nominal and the base peak set to 100.
 * @param options - see {@link ReadMolecularIonOptions}.
 * @throws {ChemError} `INVALID_PEAKS` / `EMPTY_SPECTRUM` for a malformed or empty peak list.
 * @throws {RangeError} for an option out of range.
 * @example
 * readMolecularIon([[49, 100], [84, 60], [85, 0.7], [86, 38], [88, 6.1]]) // { molecularIonMz: 84, chlorine: 2, bromine: 0, ... }
 */
export function readMolecularIon(peaks: PeakList, options: ReadMolecularIonOptions = {}): MolecularIonReading {
  const suggestLimit = option(options.suggestLimit, 5, 'suggestLimit', 1000);
  const minRelIntensity = option(options.minRelIntensity, 0.5, 'minRelIntensity', 100);
  const noise: NoiseModel = {
    relative: option(options.relativeNoise, 0.05, 'relativeNoise', 1),
    absolute: option(options.absoluteNoise, 0.1, 'absoluteNoise', 100),
  };
  if (!Number.isInteger(suggestLimit)) throw new RangeError(`suggestLimit must be an integer, got ${suggestLimit}`);
  const spectrum = normalizeSpectrum(peaks);
  // The smallest reported peak shows the list's reporting threshold (common practice: lists are
  // often cut at 1–3 % of base peak). Capped at 3 %, so that a missing isotope peak above that
  // still counts against a hypothesis.
  const smallest = spectrum.reduce((min, [, value]) => Math.min(min, value), 100);
  const detectedNoise: NoiseModel = { ...noise, detectionLimit: Math.min(3, smallest) };
  const intensity = new Map(spectrum.map(([mz, value]) => [mz, value]));
  const significant = spectrum.filter(([, value]) => value >= minRelIntensity);
  const top = (significant[significant.length - 1] ?? spectrum[spectrum.length - 1])?.[0] as number;

  // A candidate whose own cluster is a sliver beside its fitted [M−2H]+ cluster is a degenerate
  // fit: the shifted cluster explains everything, and a halogen cluster's M is read as its M+2.
  // [M−H]+ far above M is real (methanol, aldehydes), [M−2H]+ above about three times M is rare
  // in EI (common practice), so only the latter puts a candidate last.
  const plausible = (fits: HypothesisFit[]) => {
    const fit = (fits[0] as HypothesisFit).fit;
    return fit.scale >= PLAUSIBLE_M_SHARE * fit.shiftedScales[1];
  };
  const byReducedChiSquare = (a: HypothesisFit[], b: HypothesisFit[]) =>
    (a[0] as HypothesisFit).fit.chiSquare / (a[0] as HypothesisFit).fit.points - (b[0] as HypothesisFit).fit.chiSquare / (b[0] as HypothesisFit).fit.points;
  // Candidates from the lowest m/z up; the first plausible one with an acceptable fit is M, so the
  // candidates above it are never fitted. Only fits within Δχ² RIVAL_DELTA of each candidate's best
  // are kept: nothing below reads further down a list.
  const perHypothesisFit: HypothesisFit[][] = [];
  let chosenList: HypothesisFit[] | undefined;
  for (const [mz] of significant) {
    if (mz < top - WINDOW_DA) continue;
    const fits = fitHypothesesAt(intensity, mz, top + 2, detectedNoise, RIVAL_DELTA);
    if (fits.length === 0) continue;
    perHypothesisFit.push(fits);
    if (plausible(fits) && acceptable((fits[0] as HypothesisFit).fit)) {
      chosenList = fits;
      break;
    }
  }
  chosenList ??=
    [...perHypothesisFit].filter(plausible).sort(byReducedChiSquare)[0] ??
    [...perHypothesisFit].sort(byReducedChiSquare)[0];
  if (!chosenList) throw new RangeError('no candidate molecular ion could be fitted');
  const best = chosenList[0] as HypothesisFit;
  const fitted = acceptable(best.fit);
  const m = best.m;
  const { h } = best;
  const model = clusterPattern(h, best.carbon);
  // The molecular ion's own share from M up: the fitted [M−H]+ / [M−2H]+ clusters taken out.
  const o = Float64Array.from({ length: best.observed.length - LEAD_DA }, (_, k) => moleculeShare(best.observed, model, best.fit, k));
  const evidence: { label: string; value: string }[] = [];
  const notes: string[] = [];

  evidence.push({ label: 'Highest significant peak', value: `m/z ${top} (noise floor ${minRelIntensity} % of base peak)` });
  evidence.push({ label: 'Cluster starts at', value: `m/z ${m}, ${percent(o[0] as number)} of base peak` });
  const [minusOne, minusTwo] = best.fit.shiftedScales;
  if (minusOne + minusTwo > 0) {
    evidence.push({
      label: 'Overlapping [M−H]+ / [M−2H]+',
      value: `same cluster fitted at m/z ${m - 1} (${percent(minusOne * (model[0] as number))}) and m/z ${m - 2} (${percent(minusTwo * (model[0] as number))}); ratios below are the molecular ion's share`,
    });
  }
  for (const k of [1, 2, 4, 6, 8]) {
    if (k >= o.length && (model[k] ?? 0) * best.fit.scale < 0.01) continue;
    const observedRatio = ((o[k] ?? 0) / (o[0] as number)) * 100;
    const modelRatio = ((model[k] ?? 0) / (model[0] as number)) * 100;
    evidence.push({ label: `M+${k} / M`, value: `observed ${percent(observedRatio)}, model ${percent(modelRatio)}` });
  }
  evidence.push({
    label: 'Cluster fit',
    value: `${formatHypothesis(h)} with C${best.carbon}: χ² ${best.fit.chiSquare.toFixed(1)} over ${best.fit.points} m/z (acceptable ≤ ${acceptableChiSquare(best.fit.points).toFixed(1)}); σ = ${noise.relative * 100} % of each peak + ${noise.absolute} % of base peak`,
  });
  const rivals = chosenList.filter((c) => c.score - best.score <= RIVAL_DELTA && (c.h.chlorine !== h.chlorine || c.h.bromine !== h.bromine));
  const rivalNames = [...new Set(rivals.map((c) => formatHypothesis(c.h)))];
  if (rivalNames.length > 0) notes.push(`Also consistent with the cluster (within Δχ² 4): ${rivalNames.join('; ')}.`);

  let likelyAbsent = !fitted;
  if (!fitted) notes.push(`No isotope pattern fits the highest cluster (best χ²/point ${(best.fit.chiSquare / best.fit.points).toFixed(1)}): M is likely absent or the cluster is distorted.`);
  const halogens = h.chlorine + h.bromine;
  for (let d = 4; d <= 12 - 2 * halogens; d += 1) {
    const below = intensity.get(m - d) ?? 0;
    if (below >= (o[0] as number) && below >= 2) {
      likelyAbsent = true;
      notes.push(`A peak at m/z ${m - d} (${percent(below)}) would be a loss of ${d} Da from m/z ${m}, which rarely occurs: m/z ${m} is likely a fragment, not M.`);
      evidence.push({ label: 'Unlikely loss', value: `M−${d}: m/z ${m - d} at ${percent(below)} ≥ M at ${percent(o[0] as number)}` });
      break;
    }
  }

  const sameHalogens = chosenList.filter((c) => c.h.chlorine === h.chlorine && c.h.bromine === h.bromine && c.score - best.score <= RIVAL_DELTA);
  const carbon = carbonRange({
    m,
    observed: o,
    noise,
    hypotheses: [...new Map(sameHalogens.map((c) => [formatHypothesis(c.h), c.h])).values()],
    oddNitrogen: m % 2 === 1,
  });
  if (carbon) evidence.push({ label: 'Carbon from M+1', value: carbon.explanation });
  const nitrogenParity = likelyAbsent ? null : m % 2 === 1 ? 'odd' : 'even';
  if (nitrogenParity) {
    evidence.push({ label: 'Nitrogen rule', value: `M = ${m} is ${nitrogenParity}: ${nitrogenParity === 'odd' ? 'an odd' : 'an even (possibly zero)'} number of N atoms` });
  }

  const maxCluster = Math.max(...o);
  const cluster: ClusterPeak[] = [];
  o.forEach((value, k) => {
    if (value > 0) cluster.push({ mz: m + k, relIntensity: (value / maxCluster) * 100 });
  });
  let suggestions: FormulaSuggestion[] = [];
  if (!likelyAbsent && suggestLimit > 0 && m <= 2000) {
    suggestions = suggestFormulas(m, {
      observedCluster: cluster,
      elements: { Cl: [h.chlorine, h.chlorine], Br: [h.bromine, h.bromine] },
      limit: suggestLimit,
    });
  }
  return {
    molecularIonMz: likelyAbsent ? null : m,
    clusterStartMz: m,
    likelyAbsent,
    cluster,
    chlorine: h.chlorine,
    bromine: h.bromine,
    sulfurLikely: h.sulfur > 0,
    siliconLikely: h.silicon > 0,
    carbonRange: carbon ? { min: carbon.min, max: carbon.max, estimate: carbon.estimate } : null,
    nitrogenParity,
    evidence,
    suggestions,
    notes,
  };
}
