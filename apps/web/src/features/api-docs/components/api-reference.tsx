import { useMemo, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { LoadingState } from '../../../components/ui/loading-state';
import { useOpenApiDocument } from '../api/get-openapi';
import { listOperations, type ApiOperation } from '../utils/list-operations';

const methodStyle: Record<string, string> = {
  GET: 'border-rule text-ink',
  POST: 'border-ink bg-ink text-paper-raised',
  PUT: 'border-ink text-ink',
  PATCH: 'border-ink text-ink',
  DELETE: 'border-copper text-copper',
};

function CopyButton({ text, label }: { text: string; label: string }) {
  const [state, setState] = useState<'idle' | 'copied' | 'failed'>('idle');
  return (
    <span className="inline-flex items-center gap-2">
      <Button
        variant="quiet"
        aria-label={label}
        onClick={() => {
          navigator.clipboard.writeText(text).then(
            () => setState('copied'),
            () => setState('failed'),
          );
        }}
      >
        Copy
      </Button>
      <span role="status" className="text-xs text-ink-soft">{state === 'copied' ? 'Copied.' : state === 'failed' ? 'Copying was not allowed.' : ''}</span>
    </span>
  );
}

function accessText(op: ApiOperation): string {
  if (op.access === 'public') return 'no key needed';
  if (op.access === 'session') return 'browser session only (not for access keys)';
  return op.scopes.length > 0 ? `access key with scope ${op.scopes.join(' or ')}` : 'any access key';
}

function Operation({ op }: { op: ApiOperation }) {
  return (
    <article aria-label={`${op.method} ${op.path}`} className="grid gap-2 rounded-lg border border-rule-faint bg-paper-raised p-4">
      <header className="flex flex-wrap items-baseline gap-3">
        <span className={`inline-flex w-16 justify-center rounded border px-1.5 text-xs font-bold ${methodStyle[op.method] ?? ''}`}>{op.method}</span>
        <code className="font-bold text-ink">{op.path}</code>
        <span className="text-sm text-ink-soft" data-testid="scope">{accessText(op)}</span>
      </header>
      {op.summary ? <p className="font-bold text-ink">{op.summary}</p> : null}
      {op.description ? <p className="text-sm leading-relaxed text-ink">{op.description}</p> : null}
      {op.parameters.length > 0 ? (
        <ul className="grid gap-0.5 text-sm">
          {op.parameters.map((p) => (
            <li key={`${p.in}-${p.name}`}>
              <code className="font-bold">{p.name}</code>
              <span className="text-ink-soft"> · {p.in}{p.required ? ', required' : ''}{p.description ? ` — ${p.description}` : ''}</span>
            </li>
          ))}
        </ul>
      ) : null}
      {op.bodyType ? (
        <details className="text-sm">
          <summary className="cursor-pointer font-bold text-ink">Request body ({op.bodyType === 'json' ? 'application/json' : 'multipart/form-data'}) schema</summary>
          <pre className="mt-2 max-h-96 overflow-auto rounded-md bg-paper-sunk p-3 font-mono text-xs leading-relaxed text-ink">
            {JSON.stringify(op.requestSchema, null, 2)}
          </pre>
        </details>
      ) : null}
      {op.curl ? (
        <div>
          <div className="flex items-center justify-between">
            <span className="text-xs font-bold uppercase tracking-wider text-ink-soft">Example</span>
            <CopyButton text={op.curl} label={`Copy the curl example for ${op.method} ${op.path}`} />
          </div>
          <pre data-testid="curl" className="overflow-x-auto rounded-md bg-paper-sunk p-3 font-mono text-xs leading-relaxed text-ink">
            {op.curl}
          </pre>
        </div>
      ) : null}
    </article>
  );
}

/** The REST contract for tool authors, read from the API's own OpenAPI document. */
export function ApiReference({ origin }: { origin: string }) {
  const document = useOpenApiDocument();
  const [filter, setFilter] = useState('');
  const operations = useMemo(() => (document.data ? listOperations(document.data, origin) : []), [document.data, origin]);
  if (document.isPending) return <LoadingState label="Loading the API description…" />;
  if (document.isError) return <ErrorNotice title="The API description could not be loaded" error={document.error} onRetry={() => void document.refetch()} />;
  const needle = filter.trim().toLowerCase();
  const shown = needle === '' ? operations : operations.filter((op) => `${op.method} ${op.path} ${op.summary} ${op.tag}`.toLowerCase().includes(needle));
  return (
    <div className="grid gap-4">
      <div className="grid gap-1 text-sm text-ink">
        <p>
          <span className="font-bold">{document.data.info.title}</span> {document.data.info.version} · OpenAPI {document.data.openapi} ·{' '}
          <a href="/api/v1/openapi.json" className="underline decoration-rule underline-offset-4">openapi.json</a>
        </p>
        <p className="text-ink-soft">
          Create a key under Tools → Access keys, then <code>export IONFOLIO_KEY=ifk_…</code>; every example below runs as written against{' '}
          <code>{origin}</code>. Path values in <code>$CAPITALS</code> are shell variables to set first.
        </p>
      </div>
      <label className="grid max-w-sm gap-1 text-sm">
        <span className="font-bold">Filter routes</span>
        <input className="rounded-md border border-rule bg-paper-raised px-2.5 py-1.5" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="identify, entries, POST…" />
      </label>
      <p className="text-sm text-ink-soft" role="status">{shown.length} of {operations.length} routes</p>
      {shown.map((op) => (
        <Operation key={`${op.method} ${op.path}`} op={op} />
      ))}
    </div>
  );
}
