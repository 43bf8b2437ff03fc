import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { describeErrorDetails } from '../../../lib/describe-error';
import { accessKeyScopes, type AccessKeyScope } from '../api/access-key-schema';
import { useCreateAccessKey } from '../api/create-access-key';
import { SecretOnce } from './secret-once';

const scopeNotes: Record<AccessKeyScope, string> = {
  search: 'identify, batch identify, molecular-ion readings and formula tools',
  'library:read': 'entries, revisions, editions and JCAMP-DX exports',
  submit: 'create and edit drafts and send them for review',
};

/** Names a new key and picks its scopes; the secret is shown once after creation. */
export function CreateKeyForm({ allowedScopes }: { allowedScopes: readonly AccessKeyScope[] }) {
  const create = useCreateAccessKey();
  const [name, setName] = useState('');
  const [scopes, setScopes] = useState<AccessKeyScope[]>(['search']);
  const [problem, setProblem] = useState<string | null>(null);

  if (create.isSuccess) return <SecretOnce created={create.data} onDone={() => create.reset()} />;

  return (
    <form
      className="grid gap-4 rounded-lg border border-rule-faint bg-paper-raised p-5"
      onSubmit={(e) => {
        e.preventDefault();
        if (name.trim() === '') return setProblem('Give the key a name, e.g. the instrument or script that will use it.');
        if (scopes.length === 0) return setProblem('Choose at least one scope.');
        setProblem(null);
        create.mutate({ name: name.trim(), scopes: accessKeyScopes.filter((s) => scopes.includes(s)) });
      }}
    >
      <h2 className="text-lg font-bold text-ink">New access key</h2>
      <label className="grid max-w-md gap-1 text-sm">
        <span className="font-bold text-ink">Name</span>
        <input
          className="rounded-md border border-rule bg-paper px-2.5 py-1.5 text-ink hover:border-ink"
          value={name}
          maxLength={100}
          placeholder="e.g. GC-MS 2 data system"
          onChange={(e) => setName(e.target.value)}
        />
      </label>
      <fieldset className="grid gap-1.5">
        <legend className="mb-1 text-sm font-bold text-ink">Scopes</legend>
        {accessKeyScopes.map((scope) => {
          const allowed = allowedScopes.includes(scope);
          return (
            <label key={scope} className={`flex items-start gap-2 text-sm ${allowed ? '' : 'opacity-60'}`}>
              <input
                type="checkbox"
                className="mt-1.5"
                disabled={!allowed}
                checked={allowed && scopes.includes(scope)}
                onChange={(e) => setScopes(e.target.checked ? [...scopes, scope] : scopes.filter((s) => s !== scope))}
              />
              <span>
                <code className="font-bold">{scope}</code>
                <span className="text-ink-soft"> — {scopeNotes[scope]}{allowed ? '' : ' (needs the contributor role)'}</span>
              </span>
            </label>
          );
        })}
      </fieldset>
      {problem ? <p role="alert" className="text-sm font-bold text-copper">{problem}</p> : null}
      {create.isError ? (
        <div>
          <ErrorNotice title="The key could not be created" error={create.error} />
          {describeErrorDetails(create.error).map((line) => (
            <p key={line} className="mt-1 text-sm text-copper">{line}</p>
          ))}
        </div>
      ) : null}
      <Button type="submit" className="justify-self-start" disabled={create.isPending}>
        {create.isPending ? 'Creating…' : 'Create key'}
      </Button>
    </form>
  );
}
