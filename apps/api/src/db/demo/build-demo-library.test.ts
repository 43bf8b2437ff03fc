import { checkRevision, nominalMass } from '@ionfolio/chem';
import { describe, expect, it } from 'vitest';
import { buildDemoLibrary, DEMO_MARK, DEMO_REVISION_COUNTS, DEMO_STATE_COUNTS, type DemoEntryPlan } from './build-demo-library';
import { DEMO_COMPOUNDS } from './demo-compounds';

const library = buildDemoLibrary();
const DEMO_LOGINS = ['tomas.reyes', 'dana.okafor', 'ines.varga'];
const CURATORS = ['dana.okafor', 'ines.varga'];

const countBy = <K extends string>(plans: DemoEntryPlan[], key: (p: DemoEntryPlan) => K): Record<string, number> =>
  plans.reduce<Record<string, number>>((acc, p) => ({ ...acc, [key(p)]: (acc[key(p)] ?? 0) + 1 }), {});

describe('buildDemoLibrary', () => {
  it('plans one entry per demo compound, in the order of DEMO_COMPOUNDS', () => {
    expect(library.map((p) => p.compound.key)).toEqual(DEMO_COMPOUNDS.map((c) => c.key));
  });

  it('is deterministic for a seed and differs for another seed', () => {
    expect(buildDemoLibrary(1234)).toEqual(buildDemoLibrary(1234));
    expect(buildDemoLibrary()).toEqual(library);
    const other = buildDemoLibrary(4321);
    expect(other.map((p) => p.finalState)).not.toEqual(library.map((p) => p.finalState));
  });

  it('ends the entries in the planned states, the rest published', () => {
    for (const seed of [undefined, 7, 99]) {
      const states = countBy(buildDemoLibrary(seed), (p) => p.finalState);
      const others = Object.values(DEMO_STATE_COUNTS).reduce((a, b) => a + b, 0);
      expect(states).toEqual({ ...DEMO_STATE_COUNTS, published: DEMO_COMPOUNDS.length - others });
    }
    expect(DEMO_STATE_COUNTS).toEqual({ draft: 6, in_review: 5, needs_changes: 4, withdrawn: 3 });
  });

  it('gives 12 entries two revisions and 4 entries three, the rest one', () => {
    const byCount = countBy(library, (p) => String(p.revisions.length));
    expect(byCount).toEqual({ '1': DEMO_COMPOUNDS.length - 16, '2': 12, '3': 4 });
    expect(DEMO_REVISION_COUNTS).toEqual({ two: 12, three: 4 });
  });

  it('names demo users only, a curator as reviewer, and never the author as reviewer', () => {
    for (const p of library) {
      expect(DEMO_LOGINS).toContain(p.authorLogin);
      expect(CURATORS).toContain(p.reviewerLogin);
      expect(p.reviewerLogin).not.toBe(p.authorLogin);
    }
    expect(countBy(library, (p) => p.authorLogin)['tomas.reyes']).toBeGreaterThan(library.length / 2);
  });

  it('gives a decision comment exactly to needs_changes and withdrawn entries', () => {
    for (const p of library) {
      const wants = p.finalState === 'needs_changes' || p.finalState === 'withdrawn';
      expect(p.decisionComment !== undefined, p.compound.key).toBe(wants);
    }
  });

  it('marks every revision as simulated and keeps its peaks inside the scan range, with M recorded', () => {
    for (const p of library) {
      const massDa = nominalMass(p.compound.formula);
      for (const r of p.revisions) {
        expect(r.sampleNotes).toContain(DEMO_MARK);
        const { fromMz, toMz } = r.conditions.scanRange;
        expect(fromMz).toBeLessThan(massDa);
        expect(toMz).toBeGreaterThan(massDa + 10);
        for (const [mz] of r.peaks) {
          expect(mz).toBeGreaterThanOrEqual(fromMz);
          expect(mz).toBeLessThanOrEqual(toMz);
        }
        expect(r.peaks.find(([mz]) => mz === massDa)?.[1], p.compound.key).toBeGreaterThan(0);
        expect(Math.max(...r.peaks.map(([, v]) => v))).toBe(100);
      }
    }
  });

  it('records the last revision of every entry at 70 eV, with a column of the class of its retention index', () => {
    for (const p of library) {
      const last = p.revisions.at(-1);
      expect(last?.conditions.ionizationEnergyEv).toBe(70);
      if (p.compound.retentionIndex) expect(last?.conditions.column).toContain(`(${p.compound.retentionIndex.columnClass})`);
    }
  });

  it('uses mostly the quadrupole instrument and a few ion-trap runs', () => {
    const instruments = countBy(library, (p) => p.revisions[0]?.conditions.instrumentType ?? '');
    expect(Object.keys(instruments).sort()).toEqual(['ion-trap GC–MS', 'single quadrupole GC–MS']);
    expect(instruments['ion-trap GC–MS']).toBeLessThan(library.length / 3);
  });

  it('writes invented lot numbers and purities labelled as invented in the final sample notes', () => {
    for (const p of library) {
      const notes = p.revisions.at(-1)?.sampleNotes ?? '';
      expect(notes).toMatch(/\b(QA|PB|ML)-24-\d{4}\b/);
      expect(notes).toMatch(/\d+\.\d %.*\(invented demo value\)/);
    }
  });

  it('makes every later revision change something, and says what in its change note', () => {
    let changed = 0;
    for (const p of library) {
      for (let i = 1; i < p.revisions.length; i++) {
        const before = p.revisions[i - 1];
        const after = p.revisions[i];
        expect(after?.changeNote).not.toBe(before?.changeNote);
        expect(JSON.stringify({ ...after, changeNote: '' })).not.toBe(JSON.stringify({ ...before, changeNote: '' }));
        if (after?.changeNote.startsWith('Air background')) {
          const at28 = (r: typeof after) => r.peaks.find(([mz]) => mz === 28)?.[1] ?? 0;
          expect(at28(after)).toBeLessThan(at28(before as typeof after));
        }
        changed++;
      }
    }
    expect(changed).toBe(12 + 2 * 4);
  });

  it('passes the consistency checks of packages/chem: no revision fails, and final revisions warn at most about background ions', () => {
    for (const p of library) {
      p.revisions.forEach((r, i) => {
        const results = checkRevision({ formula: p.compound.formula, peaks: r.peaks, ionizationEnergyEv: r.conditions.ionizationEnergyEv });
        expect(results.filter((c) => c.status === 'fail').map((c) => `${p.compound.key} r${i + 1}: ${c.reason}`)).toEqual([]);
        if (i === p.revisions.length - 1) {
          expect(results.filter((c) => c.status === 'warn' && c.id !== 'background-ions').map((c) => `${p.compound.key}: ${c.reason}`)).toEqual([]);
        }
      });
    }
  });

  it('lets the correction stories show in the checks: a 20 eV first revision warns about the ionization energy', () => {
    const typed = library.filter((p) => p.revisions[0]?.conditions.ionizationEnergyEv === 20);
    expect(typed.length).toBeGreaterThan(0);
    for (const p of typed) {
      const r1 = p.revisions[0] as (typeof p.revisions)[number];
      const results = checkRevision({ formula: p.compound.formula, peaks: r1.peaks, ionizationEnergyEv: r1.conditions.ionizationEnergyEv });
      expect(results.find((c) => c.id === 'ionization-energy')?.status).toBe('warn');
    }
  });
});
