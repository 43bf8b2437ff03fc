import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { readJcamp } from './read-jcamp';
import { writeJcamp } from './write-jcamp';

// Seeded, so a failure reproduces on every run and machine; fast-check prints the counterexample.
const RUNS = { seed: 20260412, numRuns: 300 };

// Pieces of JCAMP-DX (McDonald & Wilks 1988 labels, Lampen et al. 1994 MS labels) and of broken files.
const PIECE = fc.constantFrom(
  '##TITLE=t', '##JCAMP-DX=5.01', '##DATA TYPE=MASS SPECTRUM', '##DATA TYPE=LINK', '##DATA TYPE=INFRARED SPECTRUM', '##BLOCKS=2',
  '##PEAK TABLE=(XY..XY)', '##XYDATA=(X++(Y..Y))', '##XYPOINTS=(XYW..XYW)', '##FIRSTX=1', '##LASTX=3', '##NPOINTS=3', '##XFACTOR=0',
  '##YFACTOR=2', '##NTUPLES=MASS', '##.IONIZATION ENERGY=70 eV', '##END=', '$$ note', '43,100', '58,25 ', '1 10 20 30', 'A0J1%', '@', '?',
  '-5,3', '1e999', '\n', '\r\n', '\r', ' ', ',', '=', '##', '\u0000',
);
const TEXT = fc.oneof(fc.string({ unit: 'binary', maxLength: 200 }), fc.array(PIECE, { maxLength: 40 }).map((p) => p.join('')));

// Intensities above 0: readJcamp drops zero intensities by design, so a round trip keeps only positive ones.
const PEAKS = fc.array(
  fc.tuple(fc.double({ min: 1e-2, max: 5000, noNaN: true }), fc.double({ min: 1e-6, max: 1e9, noNaN: true })),
  { minLength: 1, maxLength: 300 },
);
// One-line text without the JCAMP-DX markers ## and $$, which writeJcamp refuses in values.
const LABEL_TEXT = fc.string({ maxLength: 40 }).filter((s) => !/[\r\n]|##|\$\$/.test(s) && s.trim() !== '');

describe('readJcamp (properties)', () => {
  it('on any text, returns spectra of positive peaks or throws a ChemError with an offset inside the text', () => {
    fc.assert(
      fc.property(TEXT, (text) => {
        try {
          for (const spectrum of readJcamp(text)) {
            expect(spectrum.peaks.length).toBeGreaterThan(0);
            for (const [mz, intensity] of spectrum.peaks) {
              expect(mz).toBeGreaterThan(0);
              expect(intensity).toBeGreaterThan(0);
            }
          }
        } catch (error) {
          if (!(error instanceof ChemError)) throw error;
          expect(error.code).toBe('JCAMP_SYNTAX');
          expect(error.position ?? 0).toBeGreaterThanOrEqual(0);
          expect(error.position ?? 0).toBeLessThanOrEqual(text.length);
        }
      }),
      RUNS,
    );
  });

  it('readJcamp(writeJcamp(x)) gives back x: peaks in order, title, energy, retention index and formula counts', () => {
    fc.assert(
      fc.property(
        PEAKS,
        LABEL_TEXT,
        fc.option(fc.integer({ min: 5, max: 200 }), { nil: undefined }),
        fc.option(fc.integer({ min: 0, max: 10000 }), { nil: undefined }),
        (peaks, title, ionizationEnergyEv, retentionIndex) => {
          const written = writeJcamp({ title, peaks, ionizationEnergyEv, retentionIndex, formula: 'C8H8O' });
          const [read, ...more] = readJcamp(written);
          expect(more).toEqual([]);
          expect(read!.peaks).toEqual(peaks);
          expect(read!.title).toBe(title.trim());
          expect(read!.ionizationEnergyEv).toBe(ionizationEnergyEv);
          expect(read!.retentionIndex).toBe(retentionIndex);
          expect(read!.formula).toBe('C 8 H 8 O');
        },
      ),
      RUNS,
    );
  });

  it('a written file with CRLF line endings reads the same as with LF', () => {
    fc.assert(
      fc.property(PEAKS, (peaks) => {
        const written = writeJcamp({ title: 'line endings (simulated)', peaks });
        expect(readJcamp(written.replace(/\n/g, '\r\n'))[0]!.peaks).toEqual(readJcamp(written)[0]!.peaks);
      }),
      { ...RUNS, numRuns: 100 },
    );
  });
});
