import { useState } from 'react';
import { COLUMN_CLASSES, RevisionContentSchema } from '@ionfolio/contracts';
import { nominalMass } from '@ionfolio/chem';
import { Button } from '../../../components/ui/button';
import { CheckList } from '../../../components/spectrum/check-list';
import { StickPlot } from '../../../components/spectrum/stick-plot';
import { isApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { isEditable, type RevisionDraft } from '../api/revision-draft';
import { useSaveRevision, type SaveTarget } from '../api/save-revision';
import { parsePeaks, useLiveChecks } from '../hooks/use-live-checks';
import { applyBlock } from '../utils/apply-block';
import { errorsFor, fieldErrorsFromApi, fieldErrorsFromIssues, fieldLabel, type FieldErrors } from '../utils/field-errors';
import { emptyForm, formFromRevision, toRevisionInput, type SubmitForm } from '../utils/form-state';
import { Field, FormSection, inputClass } from './form-field';
import { FormulaMasses, describeFormula } from './formula-masses';
import { PeaksField } from './peaks-field';
import { StructureField } from './structure-field';

type SubmitFormProps = {
  /** The open revision being edited; none for a new entry. */
  revision?: RevisionDraft | undefined;
  onSaved: (revision: RevisionDraft, sent: boolean) => void;
  /** Loads the revision again after a 409 (someone saved it meanwhile). */
  onReload?: (() => void) | undefined;
};

/** The submit form: every field of a revision, live checks beside it, Save draft and Send for review. */
export function SubmitRevisionForm({ revision, onSaved, onReload }: SubmitFormProps) {
  const [form, setForm] = useState<SubmitForm>(() => (revision ? formFromRevision(revision) : emptyForm()));
  const [errors, setErrors] = useState<FieldErrors>([]);
  const [filledNote, setFilledNote] = useState<string | null>(null);
  const save = useSaveRevision({ onSaved });
  const live = useLiveChecks({ formula: form.formula, peaksText: form.peaksText, ionizationEnergyEv: form.ionizationEnergyEv });
  const readOnly = revision !== undefined && !isEditable(revision.state);
  const stale = isApiError(save.error) && save.error.status === 409;

  const set = <K extends keyof SubmitForm>(key: K, value: SubmitForm[K]) => setForm((f) => ({ ...f, [key]: value }));
  const text = (key: keyof SubmitForm) => ({
    value: form[key],
    onChange: (e: { target: { value: string } }) => set(key, e.target.value as never),
  });

  const start = (sendForReview: boolean) => {
    save.reset();
    // The live checks lag the typing; a save reads the peaks as they are now.
    const peaks = parsePeaks(form.peaksText);
    const parsed = RevisionContentSchema.safeParse(toRevisionInput(form, peaks.peaks));
    const local: FieldErrors = peaks.error ? [{ path: 'peaks', message: peaks.error }] : [];
    if (!parsed.success || local.length > 0) {
      setErrors([...local, ...(parsed.success ? [] : fieldErrorsFromIssues(parsed.error.issues))]);
      return;
    }
    setErrors([]);
    const target: SaveTarget = revision ? { kind: 'existing', id: revision.id, lockVersion: revision.lockVersion } : { kind: 'new' };
    save.mutate(
      { target, content: parsed.data, sendForReview },
      { onError: (error) => setErrors(fieldErrorsFromApi(error)) },
    );
  };

  const formula = describeFormula(form.formula);
  const errs = (field: string) => errorsFor(errors, field);

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_26rem]">
      <form
        aria-label="Revision"
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          start(false);
        }}
      >
        <fieldset disabled={readOnly || save.isPending} className="grid gap-6">
          <FormSection title="Compound">
            <Field label="Name" errors={errs('name')}>
              {(c) => <input {...c} className={inputClass} {...text('name')} />}
            </Field>
            <Field label="Formula" errors={errs('formula')} hint={<FormulaMasses formula={form.formula} />}>
              {(c) => <input {...c} className={`${inputClass} font-mono`} placeholder="C6H5Cl" {...text('formula')} />}
            </Field>
            <Field label="Synonyms" hint="One a line." errors={errs('synonyms')}>
              {(c) => <textarea {...c} rows={2} className={inputClass} {...text('synonyms')} />}
            </Field>
            <Field label="CAS RN" hint="Optional, e.g. 108-90-7." errors={errs('casRn')}>
              {(c) => <input {...c} className={`${inputClass} font-mono`} {...text('casRn')} />}
            </Field>
            <StructureField
              format={form.structureFormat}
              structure={form.structure}
              typedFormula={form.formula}
              errors={[...errs('structure'), ...errs('structureFormat')]}
              onChange={({ format, structure }) => setForm((f) => ({ ...f, structureFormat: format, structure }))}
            />
          </FormSection>

          <FormSection title="Spectrum">
            <PeaksField
              text={form.peaksText}
              parseError={live.peaksError}
              errors={errs('peaks').filter((m) => m !== live.peaksError)}
              disabled={readOnly}
              onTextChange={(value) => set('peaksText', value)}
              onBlock={(block, fileName) => {
                const { form: next, filled } = applyBlock(form, block);
                setForm(next);
                setFilledNote(`From ${fileName}: ${filled.join(', ')}.`);
              }}
            />
            {filledNote ? (
              <p role="status" className="md:col-span-2 text-sm text-ink-soft">
                {filledNote}
              </p>
            ) : null}
          </FormSection>

          <FormSection title="Conditions">
            <Field label="Ionization energy (eV)" hint="Library spectra are 70 eV." errors={errs('conditions.ionizationEnergyEv')}>
              {(c) => <input {...c} inputMode="decimal" className={inputClass} {...text('ionizationEnergyEv')} />}
            </Field>
            <Field label="Instrument type" errors={errs('conditions.instrumentType')}>
              {(c) => <input {...c} className={inputClass} placeholder="single quadrupole" {...text('instrumentType')} />}
            </Field>
            <Field label="Inlet" errors={errs('conditions.inlet')}>
              {(c) => <input {...c} className={inputClass} placeholder="GC" {...text('inlet')} />}
            </Field>
            <Field label="Source temperature (°C)" errors={errs('conditions.sourceTemperatureC')}>
              {(c) => <input {...c} inputMode="decimal" className={inputClass} {...text('sourceTemperatureC')} />}
            </Field>
            <Field label="Column" errors={errs('conditions.column')}>
              {(c) => <input {...c} className={inputClass} placeholder="5 % phenyl, 30 m × 0.25 mm" {...text('column')} />}
            </Field>
            <div className="grid grid-cols-2 gap-3">
              <Field label="Scan from (m/z)" errors={errs('conditions.scanRange.fromMz')}>
                {(c) => <input {...c} inputMode="decimal" className={inputClass} {...text('scanFromMz')} />}
              </Field>
              <Field label="Scan to (m/z)" errors={[...errs('conditions.scanRange.toMz'), ...errors.filter((e) => e.path === 'conditions.scanRange').map((e) => e.message)]}>
                {(c) => <input {...c} inputMode="decimal" className={inputClass} {...text('scanToMz')} />}
              </Field>
            </div>
            <Field label="Retention index" hint="Optional." errors={errs('retentionIndex')}>
              {(c) => <input {...c} inputMode="decimal" className={inputClass} {...text('retentionIndex')} />}
            </Field>
            <Field label="Column class">
              {(c) => (
                <select {...c} className={inputClass} value={form.retentionIndexColumn} onChange={(e) => set('retentionIndexColumn', e.target.value as SubmitForm['retentionIndexColumn'])}>
                  {COLUMN_CLASSES.map((cls) => (
                    <option key={cls} value={cls}>
                      {cls}
                    </option>
                  ))}
                </select>
              )}
            </Field>
          </FormSection>

          <FormSection title="Provenance">
            <Field label="Sample notes" hint="Where the standard came from and the evidence of its purity." errors={errs('sampleNotes')} className="md:col-span-2">
              {(c) => <textarea {...c} rows={3} className={inputClass} {...text('sampleNotes')} />}
            </Field>
            <Field label="Change note" hint="What this revision records or changes." errors={errs('changeNote')} className="md:col-span-2">
              {(c) => <textarea {...c} rows={2} className={inputClass} {...text('changeNote')} />}
            </Field>
          </FormSection>
        </fieldset>

        {errors.length > 0 ? (
          <div role="alert" aria-label="Problems to fix" className="mt-6 rounded-lg border border-copper/60 bg-copper-soft px-5 py-4">
            <p className="font-bold">{save.error ? describeError(save.error) : 'Fix these before saving:'}</p>
            <ul className="mt-1 list-disc pl-5">
              {errors.map((e, i) => (
                <li key={`${e.path}-${i}`}>
                  {fieldLabel(e.path)}: {e.message}
                </li>
              ))}
            </ul>
          </div>
        ) : save.isError ? (
          <div role="alert" className="mt-6 rounded-lg border border-copper/60 bg-copper-soft px-5 py-4">
            <p className="font-bold">{stale ? 'Not saved: this revision changed since you opened it' : 'Not saved'}</p>
            <p className="mt-1">{describeError(save.error)}</p>
            {stale && onReload ? (
              <>
                <p className="mt-1 text-sm">Reload to see the saved version; the changes made here since then are lost.</p>
                <Button variant="secondary" className="mt-3" onClick={onReload}>
                  Reload the revision
                </Button>
              </>
            ) : null}
          </div>
        ) : null}

        {readOnly ? null : (
          <div className="mt-6 flex flex-wrap items-center gap-3">
            <Button type="submit" variant="secondary" disabled={save.isPending}>
              Save draft
            </Button>
            <Button disabled={save.isPending} onClick={() => start(true)}>
              Send for review
            </Button>
            {save.isPending ? <span role="status">Saving…</span> : null}
          </div>
        )}
      </form>

      <aside aria-label="Live preview" className="grid content-start gap-4 lg:sticky lg:top-4">
        <h2 className="text-lg font-bold">Spectrum and checks</h2>
        {live.peaks ? (
          <StickPlot peaks={live.peaks} label={form.name || 'this spectrum'} molecularIonMz={formula ? nominalMass(formula.formula) : undefined} heightPx={240} />
        ) : (
          <p className="text-sm text-ink-soft">The stick plot appears once the peaks parse.</p>
        )}
        <section aria-label="Live consistency checks">
          <CheckList checks={live.checks} emptyNote={`The consistency checks run as you type; they are waiting for ${live.waitingFor ?? 'input'}.`} />
        </section>
      </aside>
    </div>
  );
}
