import { useState } from 'react';
import type { BatchSpectrum } from '../api/start-batch';

type BatchUploadProps = {
  /** Reads every spectrum of a file; throws an Error whose message names the file and line. */
  readSpectra: (text: string, fileName: string) => BatchSpectrum[];
  spectra: BatchSpectrum[] | null;
  onSpectra: (spectra: BatchSpectrum[] | null, fileName: string) => void;
  disabled?: boolean;
};

/** Many unknowns from one file (multi-block JCAMP-DX, or CSV/TXT with blank lines between spectra), read in the browser. */
export function BatchUpload({ readSpectra, spectra, onSpectra, disabled = false }: BatchUploadProps) {
  const [error, setError] = useState<string | null>(null);
  const read = async (file: File) => {
    setError(null);
    try {
      const found = readSpectra(await file.text(), file.name);
      onSpectra(found, file.name);
    } catch (cause) {
      onSpectra(null, file.name);
      setError(cause instanceof Error ? cause.message : `${file.name} could not be read.`);
    }
  };
  return (
    <div
      className="grid gap-2 rounded-lg border border-dashed border-rule bg-paper-raised p-4"
      onDragOver={(e) => e.preventDefault()}
      onDrop={(e) => {
        e.preventDefault();
        const file = e.dataTransfer.files[0];
        if (file && !disabled) void read(file);
      }}
    >
      <label className="grid gap-1 text-sm">
        <span className="font-bold text-ink">Unknowns file</span>
        <span className="text-ink-soft">
          A multi-block JCAMP-DX file, or CSV/TXT with one spectrum per block (blank lines between blocks, an optional <code># name</code>{' '}
          line on top of each). Drop it here or choose it:
        </span>
        <input
          type="file"
          aria-label="Unknowns file"
          accept=".jdx,.dx,.jcamp,.csv,.tsv,.txt"
          disabled={disabled}
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void read(file);
            e.target.value = '';
          }}
        />
      </label>
      {error ? <p role="alert" className="text-sm font-bold text-copper">{error}</p> : null}
      {spectra ? (
        <p role="status" className="text-sm text-ink">
          {spectra.length} {spectra.length === 1 ? 'spectrum' : 'spectra'} read:{' '}
          <span className="text-ink-soft">
            {spectra.slice(0, 5).map((s) => s.name).join(', ')}
            {spectra.length > 5 ? `, and ${spectra.length - 5} more` : ''}
          </span>
        </p>
      ) : null}
    </div>
  );
}
