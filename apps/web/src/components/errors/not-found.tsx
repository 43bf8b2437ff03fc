import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';
import { buttonClasses } from '../ui/button';

/** Shown for an address that no screen answers. */
export function NotFound() {
  return (
    <section aria-labelledby="not-found-title" className="max-w-2xl py-6">
      <h1 id="not-found-title" className="text-2xl font-bold text-ink">
        There is no page at this address
      </h1>
      <p className="mt-2 leading-relaxed text-ink-soft">
        The link may be mistyped, or the page may have moved. Entries are found from the Library.
      </p>
      <div className="mt-5 flex gap-2">
        <Link to={paths.identify.path} className={buttonClasses('secondary')}>
          Go to Identify
        </Link>
        <Link to={paths.library.path} className={buttonClasses('quiet')}>
          Open the Library
        </Link>
      </div>
    </section>
  );
}
