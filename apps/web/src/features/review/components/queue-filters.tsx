import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';

type QueueFiltersProps = {
  author: string;
  q: string;
  onApply: (filters: { author: string; q: string }) => void;
};

const inputClasses =
  'rounded-md border border-rule bg-paper-raised px-2.5 py-1.5 text-sm text-ink placeholder:text-ink-soft/70 hover:border-ink';

/** Author and text filters; applied on Enter or the button, so typing does not fire a request per key. */
export function QueueFilters({ author, q, onApply }: QueueFiltersProps) {
  const [authorText, setAuthorText] = useState(author);
  const [text, setText] = useState(q);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onApply({ author: authorText, q: text });
  };
  return (
    <form role="search" aria-label="Filter the queue" onSubmit={submit} className="mb-4 flex flex-wrap items-end gap-3">
      <label className="flex flex-col gap-1 text-xs font-bold text-ink-soft">
        Author (login)
        <input className={inputClasses} value={authorText} onChange={(event) => setAuthorText(event.target.value)} />
      </label>
      <label className="flex flex-col gap-1 text-xs font-bold text-ink-soft">
        Name, formula or accession
        <input
          type="search"
          className={`${inputClasses} w-72`}
          value={text}
          onChange={(event) => setText(event.target.value)}
        />
      </label>
      <Button type="submit" variant="secondary">
        Filter
      </Button>
      {author || q ? (
        <Button
          variant="quiet"
          onClick={() => {
            setAuthorText('');
            setText('');
            onApply({ author: '', q: '' });
          }}
        >
          Clear filters
        </Button>
      ) : null}
    </form>
  );
}
