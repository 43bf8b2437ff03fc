import { compareSpectra } from '@ionfolio/chem';
import { useMemo } from 'react';
import { MirrorPlot } from '../../../components/spectrum/mirror-plot';
import { StickPlot } from '../../../components/spectrum/stick-plot';
import type { RevisionView } from '../api/revision-view';
import { diffRevisions } from '../utils/diff-revisions';
import { PeakChanges } from './peak-changes';
import { RevisionDiffTable } from './revision-diff-table';

type RevisionComparisonProps = {
  revision: RevisionView;
  /** The entry's published revision, or null for a new entry. */
  published: RevisionView | null;
};

function similarityOf(revision: RevisionView, published: RevisionView): number | null {
  try {
    return Math.round(compareSpectra(revision.peaks, published.peaks, { method: 'cosine' }).score * 100);
  } catch {
    // A revision without usable peaks has no similarity; the checks say why.
    return null;
  }
}

/** This revision beside the published one: the mirror view, the field diff and the peak changes. */
export function RevisionComparison({ revision, published }: RevisionComparisonProps) {
  const thisLabel = `This revision r${revision.number}`;
  const publishedLabel = published ? `Published r${published.number}` : null;
  const diff = useMemo(() => diffRevisions(revision, published), [revision, published]);
  const similarity = useMemo(() => (published ? similarityOf(revision, published) : null), [revision, published]);
  return (
    <div className="space-y-6">
      <section aria-labelledby="spectra-title">
        <h2 id="spectra-title" className="mb-2 text-lg font-bold text-ink">
          Spectrum
        </h2>
        {published ? (
          <>
            <MirrorPlot
              top={{ label: thisLabel, peaks: revision.peaks, molecularIonMz: revision.nominalMass ?? null }}
              bottom={{ label: publishedLabel ?? '', peaks: published.peaks, molecularIonMz: published.nominalMass ?? null }}
              heightPx={360}
            />
            {similarity !== null ? (
              <p className="mt-2 text-sm text-ink" data-testid="similarity">
                Similarity to the published revision: <strong className="tabular-nums">{similarity}</strong> of 100 (cosine)
              </p>
            ) : null}
          </>
        ) : (
          <>
            <p className="mb-2 text-sm text-ink-soft">A new entry: there is no published revision to compare with.</p>
            <StickPlot label={thisLabel} peaks={revision.peaks} molecularIonMz={revision.nominalMass ?? null} heightPx={300} />
          </>
        )}
      </section>
      <section aria-labelledby="diff-title">
        <h2 id="diff-title" className="mb-2 text-lg font-bold text-ink">
          {published ? 'What changes' : 'Fields'}
        </h2>
        <RevisionDiffTable fields={diff.fields} afterLabel={thisLabel} beforeLabel={publishedLabel} />
      </section>
      {published ? (
        <section aria-labelledby="peaks-title">
          <h2 id="peaks-title" className="mb-2 text-lg font-bold text-ink">
            Peaks added, removed or changed
          </h2>
          <PeakChanges peaks={diff.peaks} />
        </section>
      ) : null}
    </div>
  );
}
