import type { ReactNode } from 'react';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { CheckList } from '../../../components/spectrum/check-list';
import { PeakTable } from '../../../components/spectrum/peak-table';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { StickPlot } from '../../../components/spectrum/stick-plot';
import { PageHeader } from '../../../components/ui/page-header';
import { formatDateTime } from '../../../lib/format-date-time';
import { hasRole, type Role } from '../../../lib/roles';
import type { EntryView } from '../api/entry-view';
import { EntryActions } from './entry-actions';
import { EntryComments } from './entry-comments';
import { RevisionTimeline } from './revision-timeline';
import { StructureDrawing } from './structure-drawing';

type EntryDetailsProps = {
  entry: EntryView;
  role: Role;
  onDraftCreated: (revisionId: string) => void;
};

function Panel({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section aria-label={title} className={`rounded-lg border border-rule-faint bg-paper-raised px-5 py-4 ${className}`}>
      <h2 className="mb-3 text-lg font-bold">{title}</h2>
      <PanelErrorBoundary title={title}>{children}</PanelErrorBoundary>
    </section>
  );
}

function Facts({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm leading-6">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-soft">{term}</dt>
          <dd className="tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** One entry at one revision: spectrum, peaks, compound, conditions, checks, timeline and comments. */
export function EntryDetails({ entry, role, onDraftCreated }: EntryDetailsProps) {
  const r = entry.revision;
  const c = r.conditions;
  const jcampHref = `/api/v1/entries/${encodeURIComponent(entry.accession)}/jcamp?revision=${r.number}`;
  return (
    <article className="grid gap-6">
      <PageHeader
        title={r.name}
        description={
          <span className="inline-flex flex-wrap items-center gap-2">
            <span className="font-bold tabular-nums text-ink">{r.label}</span>
            <RevisionStateBadge state={r.state} />
            {r.simulated ? (
              <span data-testid="simulated-marker" className="rounded border border-copper px-2 py-0.5 text-xs font-bold uppercase tracking-wider text-copper">
                simulated — demo only
              </span>
            ) : null}
            {r.restoredFrom ? <span className="text-sm">restores r{r.restoredFrom}</span> : null}
          </span>
        }
        actions={<EntryActions entry={entry} role={role} onDraftCreated={onDraftCreated} />}
      />
      {entry.withdrawnAt ? (
        <div role="note" aria-label="Withdrawn" className="rounded-lg border border-copper bg-copper-soft px-5 py-3">
          <p className="font-bold">
            Withdrawn from the library on <time dateTime={entry.withdrawnAt}>{formatDateTime(entry.withdrawnAt)}</time>
          </p>
          <p className="mt-1">Reason: {entry.withdrawnReason ?? 'none given'}</p>
        </div>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <Panel title="Spectrum">
          <StickPlot peaks={r.peaks} label={r.label} molecularIonMz={r.nominalMass} />
          <p className="mt-2 text-sm text-ink-soft">
            Base peak m/z {r.basePeakMz} · {r.peaks.length} peaks ·{' '}
            <a className="font-bold text-ink underline" href={jcampHref} download>
              Export JCAMP-DX
            </a>
          </p>
        </Panel>
        <Panel title="Peaks">
          <PeakTable peaks={r.peaks} caption={`Peaks of ${r.label}`} maxHeightRem={18} />
        </Panel>
      </div>

      <div className="grid gap-6 md:grid-cols-2">
        <Panel title="Compound">
          <Facts
            rows={[
              ['Formula', <span className="font-mono">{r.formula}</span>],
              ['Nominal mass', `${r.nominalMass} Da`],
              ['Monoisotopic mass', `${r.monoisotopicMass.toFixed(4)} Da`],
              ['CAS RN', r.casRn ?? '—'],
              ['Synonyms', r.synonyms.length > 0 ? r.synonyms.join('; ') : '—'],
            ]}
          />
          {r.structure && r.structureFormat ? (
            <div className="mt-3">
              <StructureDrawing structure={r.structure} format={r.structureFormat} canDraw={hasRole(role, 'contributor')} />
            </div>
          ) : null}
        </Panel>
        <Panel title="Conditions">
          <Facts
            rows={[
              ['Ionization energy', `${c.ionizationEnergyEv ?? 70} eV`],
              ['Instrument type', c.instrumentType ?? '—'],
              ['Inlet', c.inlet ?? '—'],
              ['Source temperature', c.sourceTemperatureC === null || c.sourceTemperatureC === undefined ? '—' : `${c.sourceTemperatureC} °C`],
              ['Column', c.column ?? '—'],
              ['Scan range', c.scanRange ? `m/z ${c.scanRange.fromMz}–${c.scanRange.toMz}` : '—'],
              ['Retention index', r.retentionIndex ? `${r.retentionIndex.value} (${r.retentionIndex.column} column)` : '—'],
            ]}
          />
        </Panel>
        <Panel title="Sample and change notes">
          <p className="text-sm font-bold text-ink-soft">Sample notes</p>
          <p className="whitespace-pre-wrap leading-relaxed">{r.sampleNotes || '—'}</p>
          <p className="mt-3 text-sm font-bold text-ink-soft">Change note</p>
          <p className="whitespace-pre-wrap leading-relaxed">{r.changeNote || '—'}</p>
          <p className="mt-3 text-sm text-ink-soft">
            By {r.author?.displayName ?? 'unknown'}
            {r.reviewer ? ` · reviewed by ${r.reviewer.displayName}` : ''}
            {r.publishedAt ? ` · published ${formatDateTime(r.publishedAt)}` : ''}
          </p>
        </Panel>
        <Panel title="Consistency checks">
          <CheckList checks={r.checks} emptyNote="No checks were recorded for this revision." />
        </Panel>
      </div>

      <div className="grid gap-6 md:grid-cols-2">
        <Panel title="Revisions">
          <RevisionTimeline accession={entry.accession} items={entry.revisions} shownNumber={r.number} />
        </Panel>
        <Panel title={`Comments on r${r.number}`}>
          <EntryComments revisionId={r.id} />
        </Panel>
      </div>
    </article>
  );
}
