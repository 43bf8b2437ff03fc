type LoadingStateProps = {
  label?: string;
  /** Fill the viewport, for the moments before the app knows who is signed in. */
  fullPage?: boolean;
};

/** A quiet "loading" line: three short sticks that rise in turn, and the words for screen readers. */
export function LoadingState({ label = 'Loading…', fullPage = false }: LoadingStateProps) {
  return (
    <div
      role="status"
      aria-live="polite"
      className={`flex items-center gap-3 text-ink-soft ${fullPage ? 'min-h-screen justify-center' : 'py-10'}`}
    >
      <span aria-hidden="true" className="flex h-4 items-end gap-[3px]">
        {[0, 1, 2].map((index) => (
          <span
            key={index}
            className="if-loading-stick w-[3px] rounded-sm bg-ink-soft"
            style={{ animationDelay: `${index * 160}ms` }}
          />
        ))}
      </span>
      <span>{label}</span>
    </div>
  );
}
