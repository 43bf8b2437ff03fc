import { nominalMass } from '@ionfolio/chem';
import { DEMO_COMPOUNDS, type DemoCompound } from './demo-compounds';
import { demoRandom } from './demo-random';
import { simulateSpectrum } from './simulate-spectrum';

/** The words every demo spectrum carries (PRODUCT.md, "Demo scenario"). */
export const DEMO_MARK = 'simulated — demo only';

/** Where a demo entry ends up. */
export type DemoFinalState = 'published' | 'in_review' | 'draft' | 'needs_changes' | 'withdrawn';

/** Acquisition conditions of a demo revision (invented). */
export interface DemoConditions {
  ionizationEnergyEv: number;
  instrumentType: string;
  inlet: string;
  sourceTemperatureC: number;
  column: string;
  scanRange: { fromMz: number; toMz: number };
}

/** One revision's content: simulated peaks (base peak 100) and its invented notes and conditions. */
export interface DemoRevisionPlan {
  peaks: [number, number][];
  changeNote: string;
  sampleNotes: string;
  conditions: DemoConditions;
}

/**
 * One demo entry and its history. Every revision but the last was published (so each is superseded by
 * the next); the last ends in `finalState`. `withdrawn` means the last revision was published and the
 * entry was then retired, with `decisionComment` as the reason; `needs_changes` carries the curator's
 * comment in `decisionComment`; a `draft` was never sent. `reviewerLogin` is never `authorLogin`.
 */
export interface DemoEntryPlan {
  compound: DemoCompound;
  revisions: DemoRevisionPlan[];
  finalState: DemoFinalState;
  authorLogin: string;
  reviewerLogin: string;
  /** The curator's comment for `needs_changes`, the reason for `withdrawn`; absent otherwise. */
  decisionComment?: string;
}

/** How many entries end in each state other than `published` (the rest are published). */
export const DEMO_STATE_COUNTS: Readonly<Record<Exclude<DemoFinalState, 'published'>, number>> = Object.freeze({
  draft: 6,
  in_review: 5,
  needs_changes: 4,
  withdrawn: 3,
});

/** How many entries have two and three revisions (the rest have one). */
export const DEMO_REVISION_COUNTS = Object.freeze({ two: 12, three: 4 });

/** The default seed of {@link buildDemoLibrary}. */
export const DEMO_SEED = 20240917;

const CONTRIBUTOR = 'tomas.reyes';
const CURATORS = ['dana.okafor', 'ines.varga'] as const;

const QUADRUPOLE = 'single quadrupole GC–MS';
const ION_TRAP = 'ion-trap GC–MS';
const COLUMNS = {
  'non-polar': ['30 m × 0.25 mm, 5 % phenyl polysiloxane (non-polar)', '60 m × 0.25 mm, 100 % dimethyl polysiloxane (non-polar)'],
  polar: ['30 m × 0.25 mm, polyethylene glycol (polar)'],
} as const;

const NEEDS_CHANGES_COMMENTS = [
  'Please add the purity evidence (GC-FID area %) and the lot number to the sample notes.',
  'The molecular-ion cluster is weak; please re-run with a lower split ratio and resubmit.',
  'Please confirm the column: the retention index does not fit the stated phase.',
  'Check the base peak: it looks clipped in the raw data. Re-acquire at a lower concentration.',
];
const WITHDRAW_REASONS = [
  'Withdrawn: the standard lot was found to be contaminated; a new entry will follow.',
  'Withdrawn: the material is no longer used on site.',
  'Withdrawn: recorded with the wrong scan settings; superseded by a new acquisition.',
];
const FIRST_NOTES = ['First submission.', 'Initial reference spectrum of the in-house standard.', 'New entry from the QC method validation run.'];

type Story = 'peaks' | 'notes' | 'conditions' | 'background';

/** A Fisher–Yates shuffle of 0 … n−1 with the given generator. */
function shuffledIndices(n: number, random: () => number): number[] {
  const order = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [order[i], order[j]] = [order[j] as number, order[i] as number];
  }
  return order;
}

function pick<T>(items: readonly T[], random: () => number): T {
  return items[Math.floor(random() * items.length)] as T;
}

function lotNumber(random: () => number, prefix: string): string {
  return `${prefix}-24-${String(Math.floor(random() * 9000) + 100).padStart(4, '0')}`;
}

function purityText(random: () => number, low: number): string {
  return `${(low + random() * (99.9 - low)).toFixed(1)} %`;
}

/** Sample notes as a careful analyst writes them, with invented lot numbers and purities. */
function fullSampleNotes(compound: DemoCompound, random: () => number): string {
  const byGc = 'by GC-FID (invented demo value)';
  const text = {
    'raw material': () => `Lot ${lotNumber(random, 'QA')} from the incoming-goods store, purity ${purityText(random, 98)} ${byGc}.`,
    intermediate: () =>
      `Retained in-process sample, batch ${lotNumber(random, 'PB')} (synthesis step ${1 + Math.floor(random() * 4)}), purity ${purityText(random, 95)} ${byGc}.`,
    impurity: () =>
      `Isolated by preparative GC from mother liquor ${lotNumber(random, 'ML')}; identity confirmed with a synthesised authentic sample, purity ${purityText(random, 92)} ${byGc}.`,
    solvent: () => `Solvent lot ${lotNumber(random, 'QA')}, purity ${purityText(random, 99.5)} ${byGc}.`,
    derivative: () =>
      `Silylated in-house (30 min at 70 °C) from parent lot ${lotNumber(random, 'QA')}; parent purity ${purityText(random, 98)} ${byGc}.`,
  }[compound.role]();
  return `${text} Spectrum ${DEMO_MARK}.`;
}

function baseConditions(compound: DemoCompound, random: () => number): DemoConditions {
  const massDa = nominalMass(compound.formula);
  const instrumentType = random() < 0.15 ? ION_TRAP : QUADRUPOLE;
  const columnClass = compound.retentionIndex?.columnClass ?? (random() < 0.8 ? 'non-polar' : 'polar');
  const inlet = compound.role === 'solvent' && massDa < 100 ? 'static headspace, GC split 1:20' : random() < 0.7 ? 'GC, split 1:50' : 'GC, splitless';
  const fromMz = massDa < 80 ? 14 : instrumentType === ION_TRAP ? 40 : pick([29, 33, 35], random);
  return {
    ionizationEnergyEv: 70,
    instrumentType,
    inlet,
    sourceTemperatureC: instrumentType === ION_TRAP ? 200 : pick([230, 250], random),
    column: pick(COLUMNS[columnClass], random),
    scanRange: { fromMz, toMz: massDa < 250 ? 350 : 550 },
  };
}

function simulate(compound: DemoCompound, conditions: DemoConditions, random: () => number): [number, number][] {
  const variant = conditions.instrumentType === ION_TRAP ? 1 : 0;
  return simulateSpectrum(compound, random, { variant, fromMz: conditions.scanRange.fromMz });
}

/** Adds air background (m/z 28, 32) to a spectrum and puts the base peak back at 100. */
function withAirBackground(peaks: [number, number][], air: { at28: number; at32: number }): [number, number][] {
  const sum = new Map(peaks);
  sum.set(28, (sum.get(28) ?? 0) + air.at28);
  sum.set(32, (sum.get(32) ?? 0) + air.at32);
  const sorted = [...sum.entries()].sort((a, b) => a[0] - b[0]);
  const base = Math.max(...sorted.map(([, value]) => value));
  return sorted.map(([mz, value]) => [mz, Math.round((value / base) * 10000) / 100]);
}

const copyConditions = (c: DemoConditions): DemoConditions => ({ ...c, scanRange: { ...c.scanRange } });

/**
 * The revisions of one entry: the first as submitted, each later one telling one small correction
 * story (peaks re-exported with new noise, better sample notes, corrected conditions, air background
 * removed). The first revision is the final content with the stories undone; they are then replayed.
 */
function planRevisions(compound: DemoCompound, revisionCount: number, random: () => number): DemoRevisionPlan[] {
  const finalConditions = baseConditions(compound, random);
  const finalNotes = fullSampleNotes(compound, random);
  const available: Story[] = ['peaks', 'notes', 'conditions'];
  if (finalConditions.scanRange.fromMz <= 28) available.push('background');
  const stories = shuffledIndices(available.length, random)
    .slice(0, revisionCount - 1)
    .map((i) => available[i] as Story);
  const conditionFix = pick(['source', 'energy'] as const, random);
  const air = { at28: 4 + 8 * random(), at32: 1 + 3 * random() };

  let conditions = copyConditions(finalConditions);
  if (stories.includes('conditions')) {
    if (conditionFix === 'source') conditions.sourceTemperatureC = conditions.sourceTemperatureC === 230 ? 250 : 230;
    else conditions.ionizationEnergyEv = 20;
  }
  let sampleNotes = stories.includes('notes') ? `In-house standard. Spectrum ${DEMO_MARK}.` : finalNotes;
  let background = stories.includes('background');
  let spectrum = simulate(compound, finalConditions, random);
  const peaksNow = () => (background ? withAirBackground(spectrum, air) : spectrum);

  const revisions: DemoRevisionPlan[] = [
    { peaks: peaksNow(), changeNote: pick(FIRST_NOTES, random), sampleNotes, conditions: copyConditions(conditions) },
  ];
  for (const story of stories) {
    let changeNote: string;
    if (story === 'peaks') {
      spectrum = simulate(compound, finalConditions, random);
      changeNote = 'Peak list re-exported from the averaged apex scans; small intensity corrections.';
    } else if (story === 'notes') {
      sampleNotes = finalNotes;
      changeNote = 'Sample notes: added the lot number and the purity evidence.';
    } else if (story === 'conditions') {
      changeNote =
        conditionFix === 'source'
          ? `Conditions corrected: the ion source ran at ${finalConditions.sourceTemperatureC} °C, not ${conditions.sourceTemperatureC} °C.`
          : 'Conditions corrected: the spectrum was recorded at 70 eV; 20 eV was a typing error.';
      conditions = copyConditions(finalConditions);
    } else {
      background = false;
      changeNote = 'Air background at m/z 28 and 32 removed from the peak list.';
    }
    revisions.push({ peaks: peaksNow(), changeNote, sampleNotes, conditions: copyConditions(conditions) });
  }
  return revisions;
}

function people(random: () => number): { authorLogin: string; reviewerLogin: string } {
  const roll = random();
  if (roll < 0.7) return { authorLogin: CONTRIBUTOR, reviewerLogin: random() < 0.6 ? CURATORS[0] : CURATORS[1] };
  return roll < 0.85 ? { authorLogin: CURATORS[0], reviewerLogin: CURATORS[1] } : { authorLogin: CURATORS[1], reviewerLogin: CURATORS[0] };
}

/**
 * Plans the demo library of the invented Quillmere Aroma Chemicals QC laboratory: one entry per
 * {@link DEMO_COMPOUNDS} compound, in that order, with simulated spectra ({@link simulateSpectrum}),
 * invented people among the demo users, invented lot numbers and notes that say `simulated — demo
 * only`. States and revision counts follow {@link DEMO_STATE_COUNTS} and {@link DEMO_REVISION_COUNTS};
 * which compound gets which is drawn from `seed`. The same seed gives the same plan, deeply equal.
 */
export function buildDemoLibrary(seed: number = DEMO_SEED): DemoEntryPlan[] {
  const random = demoRandom(seed);
  const n = DEMO_COMPOUNDS.length;
  const finalState: DemoFinalState[] = Array.from({ length: n }, () => 'published');
  let cursor = 0;
  const stateOrder = shuffledIndices(n, random);
  for (const [state, count] of Object.entries(DEMO_STATE_COUNTS) as [DemoFinalState, number][]) {
    for (let k = 0; k < count; k++) finalState[stateOrder[cursor++] as number] = state;
  }
  const revisionCount: number[] = Array.from({ length: n }, () => 1);
  const revisionOrder = shuffledIndices(n, random);
  revisionOrder.slice(0, DEMO_REVISION_COUNTS.two).forEach((i) => (revisionCount[i] = 2));
  revisionOrder.slice(DEMO_REVISION_COUNTS.two, DEMO_REVISION_COUNTS.two + DEMO_REVISION_COUNTS.three).forEach((i) => (revisionCount[i] = 3));

  return DEMO_COMPOUNDS.map((compound, i): DemoEntryPlan => {
    const state = finalState[i] as DemoFinalState;
    const plan: DemoEntryPlan = {
      compound,
      revisions: planRevisions(compound, revisionCount[i] as number, random),
      finalState: state,
      ...people(random),
    };
    if (state === 'needs_changes') plan.decisionComment = pick(NEEDS_CHANGES_COMMENTS, random);
    if (state === 'withdrawn') plan.decisionComment = pick(WITHDRAW_REASONS, random);
    return plan;
  });
}
