import { PageHeader } from './page-header';

type PlaceholderPageProps = {
  title: string;
  /** One sentence: what the screen will hold. */
  summary: string;
};

/** A screen that a later release builds: its title, what it will hold, and nothing pretending to work. */
export function PlaceholderPage({ title, summary }: PlaceholderPageProps) {
  return (
    <section>
      <PageHeader title={title} description={summary} />
      <div className="rounded-lg border border-rule-faint bg-paper-raised px-6 py-8 text-ink-soft">
        This screen is being built. Nothing here changes the library yet.
      </div>
    </section>
  );
}
