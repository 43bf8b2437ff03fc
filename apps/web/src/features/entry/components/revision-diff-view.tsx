import { compareSpectra } from '@ionfolio/chem';
import { useMemo } from 'react';
import { MirrorPlot } from '../../../components/spectrum/mirror-plot';
import type { EntryRevision } from '../api/entry-view';
import { diffPeaks, diffRevisionFields, PEAK_CHANGE_FLOOR, type PeakChange } from '../utils/revision-diff';

const head = 'px-3 py-1.5 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const cell = 'px-3 py-1 align-top';

function cosineTimes100(before: EntryRevision, after: EntryRevision): string {
  try {
    return (compareSpectra(after.peaks, before.peaks, { method: 'cosine' }).score * 100).toFixed(1);
  } catch {
    return '—';
  }
}

function intensity(value: number | null): string {
  return value === null ? '—' : String(Math.round(value * 100) / 100);
}

function PeakGroup({ title, items, beforeLabel, afterLabel }: { title: string; items: PeakChange[]; beforeLabel: string; afterLabel: string }) {
  return (
    <div className="min-w-0">
      <h4 className="mb-1 text-sm font-bold text-ink">
        {title} ({items.length})
      </h4>
      {items.length === 0 ? (
        <p className="text-sm text-ink-soft">None.</p>
      ) : (
        <div className="max-h-56 overflow-y-auto rounded-md border border-rule-faint">
          <table className="w-full border-collapse text-sm leading-6">
            <caption className="sr-only">Peaks {title.toLowerCase()}</caption>
            <thead className="sticky top-0 border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className={head}>m/z</th>
                <th scope="col" className={`${head} text-right`}>{beforeLabel}</th>
                <th scope="col" className={`${head} text-right`}>{afterLabel}</th>
              </tr>
            </thead>
            <tbody>
              {items.map((p) => (
                <tr key={p.mz} className="border-b border-rule-faint last:border-b-0">
                  <th scope="row" className={`${cell} text-left font-normal tabular-nums`}>{p.mz}</th>
                  <td className={`${cell} text-right tabular-nums text-ink-soft`}>{intensity(p.before)}</td>
                  <td className={`${cell} text-right tabular-nums`}>{intensity(p.after)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

/** Two revisions side by side: mirror view, cosine similarity, fields and peaks that differ (`before` → `after`). */
export function RevisionDiffView({ before, after }: { before: EntryRevision; after: EntryRevision }) {
  const beforeLabel = `r${before.number}`;
  const afterLabel = `r${after.number}`;
  const fields = useMemo(() => diffRevisionFields(before, after), [before, after]);
  const peaks = useMemo(() => diffPeaks(before.peaks, after.peaks), [before, after]);
  const similarity = useMemo(() => cosineTimes100(before, after), [before, after]);
  const changed = fields.filter((f) => f.changed);
  const same = fields.filter((f) => !f.changed);
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-5" data-testid="revision-diff">
      <p className="text-sm">
        <span className="text-ink-soft">Cosine similarity of {afterLabel} and {beforeLabel} (0–100): </span>
        <output aria-label="Cosine similarity" className="text-lg font-bold tabular-nums text-ink">
          {similarity}
        </output>
      </p>
      <MirrorPlot
        top={{ label: afterLabel, peaks: after.peaks, molecularIonMz: after.nominalMass }}
        bottom={{ label: beforeLabel, peaks: before.peaks, molecularIonMz: before.nominalMass }}
        heightPx={340}
      />
      <div>
        <h3 className="mb-1 font-bold text-ink">Fields</h3>
        {changed.length === 0 ? (
          <p className="text-sm text-ink-soft">No field differs.</p>
        ) : (
          <div className="overflow-x-auto rounded-md border border-rule-faint">
            <table className="w-full border-collapse text-sm leading-6">
              <caption className="sr-only">Fields that differ</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className={head}>Field</th>
                  <th scope="col" className={head}>{beforeLabel}</th>
                  <th scope="col" className={head}>{afterLabel}</th>
                </tr>
              </thead>
              <tbody>
                {changed.map((f) => (
                  <tr key={f.field} data-field={f.field} className="border-b border-rule-faint last:border-b-0">
                    <th scope="row" className={`${cell} whitespace-nowrap text-left font-bold`}>{f.field}</th>
                    <td className={`${cell} whitespace-pre-wrap break-words text-ink-soft`}>{f.before}</td>
                    <td className={`${cell} whitespace-pre-wrap break-words`}>{f.after}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {same.length > 0 ? <p className="mt-1 text-sm text-ink-soft">The same in both: {same.map((f) => f.field).join(', ')}.</p> : null}
      </div>
      <div>
        <h3 className="mb-1 font-bold text-ink">Peaks</h3>
        <div className="grid gap-4 md:grid-cols-3">
          <PeakGroup title="Added" items={peaks.added} beforeLabel={beforeLabel} afterLabel={afterLabel} />
          <PeakGroup title="Removed" items={peaks.removed} beforeLabel={beforeLabel} afterLabel={afterLabel} />
          <PeakGroup title="Changed" items={peaks.changed} beforeLabel={beforeLabel} afterLabel={afterLabel} />
        </div>
        <p className="mt-1 text-sm text-ink-soft">
          {peaks.unchangedCount} peaks the same (intensities within {PEAK_CHANGE_FLOOR} % of the base peak).
        </p>
      </div>
    </div>
  );
}
