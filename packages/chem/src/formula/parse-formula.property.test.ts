import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ELEMENT_SYMBOLS, type ElementSymbol } from '../elements/elements';
import { ChemError } from '../errors/chem-error';
import { formatFormula } from './format-formula';
import { parseFormula } from './parse-formula';

// Seeded, so a failure reproduces on every run and machine; fast-check prints the counterexample.
const RUNS = { seed: 20260412, numRuns: 400 };

// Pieces of the formula grammar, near misses (Xx, CL, lone digits) and stray characters.
const PIECE = fc.constantFrom('C', 'H', 'Cl', 'Br', 'N', 'O', 'Si', 'Xx', 'CL', 'c', 'l', '2', '10', '0', '9999999', '(', ')', '[', ']', '{', '}', '.', '·', '*', ' ', '\t', '+', '-', '\u0000');
const TEXT = fc.oneof(fc.string({ unit: 'binary', maxLength: 60 }), fc.array(PIECE, { maxLength: 30 }).map((p) => p.join('')));

const SYMBOL = fc.constantFrom(...ELEMENT_SYMBOLS);
const COUNT = fc.integer({ min: 0, max: 60 });
const COUNTS = fc.dictionary(SYMBOL, COUNT, { minKeys: 1, maxKeys: ELEMENT_SYMBOLS.length }) as fc.Arbitrary<Partial<Record<ElementSymbol, number>>>;

/** Formula text as people write it: atoms with counts, groups with multipliers, adducts, blanks. */
const FORMULA_TEXT: fc.Arbitrary<string> = fc.letrec<{ group: string; part: string; formula: string }>((tie) => ({
  group: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.tuple(SYMBOL, fc.option(fc.integer({ min: 0, max: 20 }), { nil: undefined })).map(([s, n]) => `${s}${n ?? ''}`),
    fc
      .tuple(fc.constantFrom(['(', ')'], ['[', ']'], ['{', '}']), fc.array(tie('group'), { minLength: 1, maxLength: 3 }), fc.integer({ min: 1, max: 9 }))
      .map(([[open, close], inner, n]) => `${open}${inner.join('')}${close}${n}`),
  ),
  part: fc.tuple(fc.array(tie('group'), { minLength: 1, maxLength: 4 }), fc.boolean()).map(([g, spaced]) => g.join(spaced ? ' ' : '')),
  formula: fc
    .tuple(tie('part'), fc.array(fc.tuple(fc.constantFrom('.', '·', '*'), fc.integer({ min: 1, max: 5 }), tie('part')), { maxLength: 2 }))
    .map(([first, rest]) => first + rest.map(([sep, n, part]) => `${sep}${n}${part}`).join('')),
})).formula;

/** Counts without the zero entries: what parseFormula returns for them. */
const withoutZeros = (counts: Partial<Record<ElementSymbol, number>>) => Object.fromEntries(Object.entries(counts).filter(([, n]) => n !== 0));

describe('parseFormula and formatFormula (properties)', () => {
  it('on any text, returns positive counts of known elements or throws a ChemError with an offset inside the text', () => {
    fc.assert(
      fc.property(TEXT, (text) => {
        try {
          const counts = parseFormula(text);
          for (const [symbol, n] of Object.entries(counts)) {
            expect(ELEMENT_SYMBOLS).toContain(symbol);
            expect(Number.isInteger(n) && n > 0).toBe(true);
          }
        } catch (error) {
          if (!(error instanceof ChemError)) throw error;
          expect(['FORMULA_SYNTAX', 'UNKNOWN_ELEMENT']).toContain(error.code);
          expect(error.position ?? 0).toBeGreaterThanOrEqual(0);
          expect(error.position ?? 0).toBeLessThanOrEqual(text.length);
        }
      }),
      RUNS,
    );
  });

  it('formatted counts parse back to the same counts (zeros left out)', () => {
    fc.assert(
      fc.property(COUNTS.filter((c) => Object.values(c).some((n) => n > 0)), (counts) => {
        expect(parseFormula(formatFormula(counts))).toEqual(withoutZeros(counts));
      }),
      RUNS,
    );
  });

  it('formatFormula(parseFormula(f)) is stable: formatting its own output changes nothing', () => {
    fc.assert(
      fc.property(FORMULA_TEXT, (text) => {
        let counts;
        try {
          counts = parseFormula(text);
        } catch (error) {
          // Well-formed text is refused only when nested multipliers push a count past MAX_ATOM_COUNT.
          expect(error).toBeInstanceOf(ChemError);
          expect((error as ChemError).message).toMatch(/^More than 1000000 atoms of [A-Z][a-z]?$/);
          return;
        }
        const once = formatFormula(counts);
        // Every count 0 ("C0"): nothing to write, and nothing was counted.
        if (once === '') return expect(counts).toEqual({});
        expect(formatFormula(parseFormula(once))).toBe(once);
        expect(parseFormula(once)).toEqual(counts);
      }),
      RUNS,
    );
  });
});
