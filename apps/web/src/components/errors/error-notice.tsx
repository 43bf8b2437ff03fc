import { describeError } from '../../lib/describe-error';
import { isApiError } from '../../lib/api-error';
import { Button } from '../ui/button';

type ErrorNoticeProps = {
  error: unknown;
  title?: string;
  onRetry?: () => void;
};

/** An error shown in place of what failed to load: what went wrong, the server's code, a way to retry. */
export function ErrorNotice({ error, title = 'This could not be loaded', onRetry }: ErrorNoticeProps) {
  return (
    <div role="alert" className="rounded-lg border border-copper/60 bg-copper-soft px-5 py-4 text-ink">
      <p className="font-bold">{title}</p>
      <p className="mt-1 leading-relaxed">{describeError(error)}</p>
      {isApiError(error) && error.status > 0 ? (
        <p className="mt-1 text-sm text-ink-soft">
          Code {error.code} · HTTP {error.status}
        </p>
      ) : null}
      {onRetry ? (
        <Button variant="secondary" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
