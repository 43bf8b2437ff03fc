import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { parsePeakList } from './parse-peak-list';

// Seeded, so a failure reproduces on every run and machine; fast-check prints the counterexample.
const RUNS = { seed: 20260412, numRuns: 400 };

// Pieces of the peak-list grammar and of what people paste, so random text reaches deep paths.
const PIECE = fc.constantFrom('43', '58.5', '-1', '0', '1e3', '1e400', '.5', 'NaN', 'Infinity', 'm/z', 'mz', 'intensity', 'abundance', 'x', ',', ';', ':', '\t', ' ', '\n', '\r\n', '\r', '#', '(', ')', '"', '\u0000', 'é');
const TEXT = fc.oneof(fc.string({ unit: 'binary', maxLength: 120 }), fc.array(PIECE, { maxLength: 40 }).map((p) => p.join('')));

const MZ = fc.double({ min: 1e-3, max: 1e5, noNaN: true, noDefaultInfinity: true });
const INTENSITY = fc.double({ min: 0, max: 1e9, noNaN: true, noDefaultInfinity: true }).map((v) => v + 0); // + 0 turns -0 into 0
const PEAKS = fc.array(fc.tuple(MZ, INTENSITY), { minLength: 1, maxLength: 60 });

/** The layouts parsePeakList documents, each written with String(), the shortest text that reads back. */
const LAYOUTS: Record<string, (peaks: [number, number][]) => string> = {
  lines: (p) => p.map(([mz, i]) => `${mz} ${i}`).join('\n'),
  tabs: (p) => p.map(([mz, i]) => `${mz}\t${i}`).join('\n'),
  'comma lines, CRLF': (p) => p.map(([mz, i]) => `${mz},${i}`).join('\r\n'),
  'pairs on one line': (p) => p.map(([mz, i]) => `${mz}:${i}`).join(' '),
  'CSV with a header': (p) => ['m/z,intensity', ...p.map(([mz, i]) => `${mz},${i}`)].join('\n'),
  'TSV with a header and extra column': (p) => ['RT\tm/z\tabundance', ...p.map(([mz, i]) => `1.5\t${mz}\t${i}`)].join('\n'),
};

describe('parsePeakList (properties)', () => {
  it('on any text, returns peaks or throws a ChemError with an offset inside the text, never anything else', () => {
    fc.assert(
      fc.property(TEXT, (text) => {
        try {
          const peaks = parsePeakList(text);
          expect(peaks.length).toBeGreaterThan(0);
          for (const [mz, intensity] of peaks) {
            expect(mz).toBeGreaterThan(0);
            expect(intensity).toBeGreaterThanOrEqual(0);
            expect(Number.isFinite(mz) && Number.isFinite(intensity)).toBe(true);
          }
        } catch (error) {
          if (!(error instanceof ChemError)) throw error;
          expect(error.position ?? 0).toBeGreaterThanOrEqual(0);
          expect(error.position ?? 0).toBeLessThanOrEqual(text.length);
        }
      }),
      RUNS,
    );
  });

  it('on anything that is not a string, throws a TypeError', () => {
    fc.assert(
      fc.property(fc.oneof(fc.integer(), fc.constant(null), fc.constant(undefined), fc.array(fc.nat())), (value) => {
        expect(() => parsePeakList(value as unknown as string)).toThrow(TypeError);
      }),
      { ...RUNS, numRuns: 50 },
    );
  });

  it.each(Object.keys(LAYOUTS))('peaks written as %s parse back to the same numbers, in order', (layout) => {
    const write = LAYOUTS[layout]!;
    fc.assert(
      fc.property(PEAKS, (peaks) => {
        expect(parsePeakList(write(peaks))).toEqual(peaks);
      }),
      RUNS,
    );
  });
});
