import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { useUploadSpectrum, type UploadResult, type UploadedBlock } from '../api/upload-spectrum';
import { Field, inputClass } from './form-field';

type PeaksFieldProps = {
  text: string;
  parseError: string | null;
  errors: readonly string[];
  disabled: boolean;
  onTextChange: (text: string) => void;
  /** A block chosen from an uploaded file: the form takes its peaks and metadata. */
  onBlock: (block: UploadedBlock, fileName: string) => void;
};

function blockName(block: UploadedBlock): string {
  return block.title?.trim() ? block.title : `Block ${block.index + 1}`;
}

/** Peaks pasted in any common layout, or read by the server from an uploaded JCAMP-DX, CSV or TXT file. */
export function PeaksField({ text, parseError, errors, disabled, onTextChange, onBlock }: PeaksFieldProps) {
  const upload = useUploadSpectrum();
  const [choice, setChoice] = useState<{ result: UploadResult; index: number } | null>(null);

  const onFile = (file: File) => {
    setChoice(null);
    upload.mutate(file, {
      onSuccess: (result) => {
        const [only] = result.blocks;
        if (result.blocks.length === 1 && only) onBlock(only, result.fileName);
        else setChoice({ result, index: result.blocks[0]?.index ?? 0 });
      },
    });
  };

  return (
    <div className="md:col-span-2 grid gap-3">
      <Field
        label="Peaks"
        hint="Paste m/z and intensity: one pair a line, m/z:intensity pairs, or CSV/TSV with a header. Any intensity scale."
        errors={[...(parseError ? [parseError] : []), ...errors]}
      >
        {(control) => (
          <textarea
            {...control}
            rows={8}
            className={`${inputClass} font-mono text-sm`}
            value={text}
            disabled={disabled}
            placeholder={'77 60\n112 100\n114 32'}
            onChange={(e) => onTextChange(e.target.value)}
          />
        )}
      </Field>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <label className="text-ink-soft">
          Or upload a spectrum file (JCAMP-DX, CSV, TXT){' '}
          <input
            type="file"
            aria-label="Upload a spectrum file"
            accept=".jdx,.dx,.jcamp,.csv,.tsv,.txt"
            disabled={disabled || upload.isPending}
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) onFile(file);
              e.target.value = '';
            }}
          />
        </label>
        {upload.isPending ? <span role="status">Reading the file…</span> : null}
      </div>
      {upload.isError ? <ErrorNotice title="The file could not be read" error={upload.error} /> : null}
      {choice ? (
        <div role="group" aria-label="Choose a spectrum from the file" className="rounded-md border border-rule bg-paper-raised p-4">
          <p className="font-bold">
            {choice.result.fileName} holds {choice.result.blocks.length} spectra. Choose one:
          </p>
          <ul className="mt-2 grid gap-1">
            {choice.result.blocks.map((block) => (
              <li key={block.index}>
                <label className="inline-flex items-center gap-2">
                  <input
                    type="radio"
                    name="upload-block"
                    checked={choice.index === block.index}
                    onChange={() => setChoice({ ...choice, index: block.index })}
                  />
                  <span>
                    {blockName(block)} <span className="text-ink-soft">· {block.peaks.length} peaks{block.formula ? ` · ${block.formula}` : ''}</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          <div className="mt-3 flex gap-2">
            <Button
              onClick={() => {
                const block = choice.result.blocks.find((b) => b.index === choice.index);
                if (block) onBlock(block, choice.result.fileName);
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
