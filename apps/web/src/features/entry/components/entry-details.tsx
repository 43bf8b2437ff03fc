import { rdbe } from '@ionfolio/chem';
import { Link } from 'react-router-dom';
import { CheckList } from '../../../components/spectrum/check-list';
import { PeakTable } from '../../../components/spectrum/peak-table';
import { RevisionStateBadge } from '../../../components/spectrum/revision-state-badge';
import { StickPlot } from '../../../components/spectrum/stick-plot';
import { buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { identifyHref } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format-date-time';
import { hasRole, type Role } from '../../../lib/roles';
import type { EntryView } from '../api/entry-view';
import { EntryActions } from './entry-actions';
import { EntryComments } from './entry-comments';
import { EntryEditions } from './entry-editions';
import { EntryFragmentNotes } from './entry-fragment-notes';
import { Facts, Panel } from './entry-panel';
import { MolecularIonCheck } from './molecular-ion-check';
import { RevisionCompare } from './revision-compare';
import { RevisionTimeline } from './revision-timeline';
import { StructureDrawing } from './structure-drawing';

type EntryDetailsProps = {
  entry: EntryView;
  role: Role;
  onDraftCreated: (revisionId: string) => void;
};

function rdbeText(formula: string): string {
  try {
    return String(rdbe(formula));
  } catch {
    return '—';
  }
}

/** One entry at one revision: spectrum, peaks, compound, evidence, conditions, checks, timeline, comparison, editions and comments. */
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
        actions={
          <div className="grid justify-items-end gap-2">
            <Link
              className={buttonClasses('secondary')}
              to={identifyHref({ from: entry.accession, exclude: entry.accession })}
              title="Opens Identify with this entry's published spectrum, leaving the entry itself out of the candidates"
            >
              Search the library with this spectrum
            </Link>
            <EntryActions entry={entry} role={role} onDraftCreated={onDraftCreated} />
          </div>
        }
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
              ['RDBE', rdbeText(r.formula)],
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
        <Panel title="Molecular-ion check">
          <MolecularIonCheck peaks={r.peaks} formula={r.formula} nominalMassDa={r.nominalMass} />
        </Panel>
        <Panel title="Fragment notes">
          <EntryFragmentNotes peaks={r.peaks} formula={r.formula} molecularIonMz={r.nominalMass} />
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
        <div className="grid content-start gap-6">
          <Panel title="Editions">
            <EntryEditions editions={entry.editions} shownNumber={r.number} />
          </Panel>
          <Panel title={`Comments on r${r.number}`}>
            <EntryComments revisionId={r.id} />
          </Panel>
        </div>
      </div>

      <Panel title="Compare revisions">
        <RevisionCompare entry={entry} />
      </Panel>
    </article>
  );
}
