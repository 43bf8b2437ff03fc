import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import type { CreatedAccessKey } from '../api/create-access-key';

/** The new key's secret, this once: a copy button and the warning that Ionfolio keeps only its hash. */
export function SecretOnce({ created, onDone }: { created: CreatedAccessKey; onDone: () => void }) {
  const [copied, setCopied] = useState<'idle' | 'copied' | 'failed'>('idle');
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(created.secret);
      setCopied('copied');
    } catch {
      setCopied('failed');
    }
  };
  return (
    <section aria-label="New key secret" className="grid gap-3 rounded-lg border-2 border-copper bg-paper-raised p-5">
      <h2 className="text-lg font-bold text-ink">Key “{created.key.name}” created</h2>
      <p role="alert" className="font-bold text-copper">
        Copy this key now. It is shown only once: Ionfolio stores only a hash and cannot show it again.
      </p>
      <code data-testid="key-secret" className="block select-all break-all rounded-md border border-rule bg-paper px-3 py-2 font-mono text-sm text-ink">
        {created.secret}
      </code>
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => void copy()}>Copy key</Button>
        <span role="status" className="text-sm text-ink-soft">
          {copied === 'copied' ? 'Copied.' : copied === 'failed' ? 'This browser did not allow copying: select the key and copy it by hand.' : ''}
        </span>
        <Button variant="secondary" onClick={onDone}>
          I have stored it
        </Button>
      </div>
      <p className="text-sm text-ink-soft">
        Tools send it as <code>Authorization: Bearer {created.key.prefix}…</code>. Scopes: {created.key.scopes.join(', ')}.
      </p>
    </section>
  );
}
