import { useId, useState, type DragEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { readSpectraText, SpectrumFileError, type NamedSpectrum } from '../utils/read-spectra-text';

type SpectrumSourceProps = {
  text: string;
  onTextChange: (text: string) => void;
  /** The problem with the pasted text, with its line, or null. */
  error: string | null;
  /** A spectrum taken from a dropped or chosen file. */
  onSpectrum: (spectrum: NamedSpectrum) => void;
  disabled?: boolean;
};

export const spectrumFileAccept = '.jdx,.dx,.jcamp,.csv,.tsv,.txt';

/** The query spectrum: pasted as a peak list, or read in the browser from a dropped JCAMP-DX, CSV or TXT file. */
export function SpectrumSource({ text, onTextChange, error, onSpectrum, disabled = false }: SpectrumSourceProps) {
  const errorId = useId();
  const [fileError, setFileError] = useState<string | null>(null);
  const [choice, setChoice] = useState<{ fileName: string; spectra: NamedSpectrum[]; index: number } | null>(null);
  const [dragging, setDragging] = useState(false);

  const readFile = async (file: File) => {
    setFileError(null);
    setChoice(null);
    try {
      const spectra = readSpectraText(await file.text(), file.name);
      const [only] = spectra;
      if (spectra.length === 1 && only) onSpectrum(only);
      else setChoice({ fileName: file.name, spectra, index: 0 });
    } catch (cause) {
      setFileError(cause instanceof SpectrumFileError ? cause.message : `${file.name} could not be read.`);
    }
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    const file = event.dataTransfer.files[0];
    if (file && !disabled) void readFile(file);
  };

  return (
    <div className="grid gap-3">
      <label className="grid gap-1">
        <span className="font-bold text-ink">Peak list</span>
        <span className="text-sm text-ink-soft">
          m/z and intensity on any scale: one pair a line, <code>m/z:intensity</code> pairs, or CSV/TSV with a header row.
        </span>
        <textarea
          rows={9}
          spellCheck={false}
          className="w-full rounded-md border border-rule bg-paper-raised px-3 py-2 font-mono text-sm leading-relaxed text-ink placeholder:text-ink-soft/70 hover:border-ink"
          value={text}
          disabled={disabled}
          placeholder={'51 14\n77 60\n112 100\n113 6.6\n114 32.5'}
          aria-invalid={error !== null}
          aria-describedby={error ? errorId : undefined}
          onChange={(e) => onTextChange(e.target.value)}
        />
      </label>
      {error ? (
        <p id={errorId} role="alert" className="text-sm font-bold text-copper">
          {error}
        </p>
      ) : null}
      <div
        data-testid="drop-zone"
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`rounded-md border border-dashed px-4 py-3 text-sm ${dragging ? 'border-ink bg-paper-sunk' : 'border-rule'}`}
      >
        <label className="text-ink-soft">
          Drop a JCAMP-DX, CSV or TXT file here, or choose one:{' '}
          <input
            type="file"
            aria-label="Spectrum file"
            accept={spectrumFileAccept}
            disabled={disabled}
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) void readFile(file);
              e.target.value = '';
            }}
          />
        </label>
        <p className="mt-1 text-xs text-ink-soft">The file is read in this browser; it is not uploaded.</p>
      </div>
      {fileError ? (
        <p role="alert" className="text-sm font-bold text-copper">
          {fileError}
        </p>
      ) : null}
      {choice ? (
        <div role="group" aria-label="Choose a spectrum from the file" className="rounded-md border border-rule bg-paper-raised p-4">
          <p className="font-bold">
            {choice.fileName} holds {choice.spectra.length} spectra. Choose one:
          </p>
          <ul className="mt-2 grid gap-1">
            {choice.spectra.map((spectrum, index) => (
              <li key={index}>
                <label className="inline-flex items-center gap-2">
                  <input type="radio" name="file-block" checked={choice.index === index} onChange={() => setChoice({ ...choice, index })} />
                  <span>
                    {spectrum.name}{' '}
                    <span className="text-ink-soft">
                      · {spectrum.peaks.length} peaks{spectrum.formula ? ` · ${spectrum.formula}` : ''}
                    </span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          <div className="mt-3 flex gap-2">
            <Button
              onClick={() => {
                const spectrum = choice.spectra[choice.index];
                if (spectrum) onSpectrum(spectrum);
                setChoice(null);
              }}
            >
              Use this spectrum
            </Button>
            <Button variant="quiet" onClick={() => setChoice(null)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
