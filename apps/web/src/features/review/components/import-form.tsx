import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { describeError, describeErrorDetails } from '../../../lib/describe-error';
import type { ImportTarget } from '../api/start-import';
import { useStartImport } from '../api/start-import';

/** Chooses one multi-block JCAMP-DX file and where its spectra land, and starts the import job. */
export function ImportForm({ onStarted }: { onStarted: (jobId: string) => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [target, setTarget] = useState<ImportTarget>('draft');
  const [missing, setMissing] = useState(false);
  const start = useStartImport();
  const fileId = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) {
      setMissing(true);
      return;
    }
    start.mutate({ file, target }, { onSuccess: ({ job }) => onStarted(job.id) });
  };
  const details = describeErrorDetails(start.error);
  return (
    <form onSubmit={submit} className="max-w-2xl space-y-4 rounded-lg border border-rule-faint bg-paper-raised p-5">
      <div>
        <label htmlFor={fileId} className="block font-bold text-ink">
          JCAMP-DX file
        </label>
        <p className="text-sm text-ink-soft">One file with many blocks (a LINK file); each block becomes one entry.</p>
        <input
          id={fileId}
          type="file"
          accept=".jdx,.dx,.jcamp"
          className="mt-2 block text-sm text-ink file:mr-3 file:rounded-md file:border file:border-rule file:bg-paper file:px-3 file:py-1.5 file:text-ink"
          onChange={(event) => {
            setFile(event.target.files?.[0] ?? null);
            setMissing(false);
          }}
        />
        {missing ? <p className="mt-1 text-sm font-bold text-copper">Choose a file first.</p> : null}
      </div>
      <fieldset>
        <legend className="font-bold text-ink">The imported revisions become</legend>
        <div className="mt-1 flex flex-wrap gap-x-6 gap-y-1 text-sm">
          {(
            [
              ['draft', 'drafts (checked and sent later)'],
              ['in_review', 'in review (straight onto the desk)'],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="inline-flex items-center gap-2">
              <input type="radio" name="target" value={value} checked={target === value} onChange={() => setTarget(value)} />
              {label}
            </label>
          ))}
        </div>
      </fieldset>
      {start.isError ? (
        <div role="alert" className="text-sm text-copper">
          <p>The import did not start: {describeError(start.error)}</p>
          {details.length > 0 ? (
            <ul className="list-disc pl-5">
              {details.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <Button type="submit" disabled={start.isPending}>
        {start.isPending ? 'Uploading…' : 'Start the import'}
      </Button>
    </form>
  );
}
