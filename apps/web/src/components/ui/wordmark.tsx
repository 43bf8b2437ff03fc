/**
 * Ionfolio's wordmark: the name set in Lato with a small stick spectrum before it (five thin sticks,
 * the tallest copper, as a base peak would be marked).
 */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const sticks = [0.45, 0.75, 0.3, 1, 0.55];
  const heightPx = size === 'lg' ? 30 : 20;
  const stickGapPx = size === 'lg' ? 6 : 4;
  const widthPx = stickGapPx * (sticks.length - 1) + 2;
  return (
    <span className={`inline-flex items-end gap-2 ${size === 'lg' ? 'text-3xl' : 'text-xl'}`}>
      <svg
        aria-hidden="true"
        width={widthPx}
        height={heightPx}
        viewBox={`0 0 ${widthPx} ${heightPx}`}
        className="mb-[0.2em] shrink-0"
      >
        {sticks.map((fraction, index) => (
          <rect
            key={index}
            x={index * stickGapPx}
            y={heightPx * (1 - fraction)}
            width={2}
            height={heightPx * fraction}
            className={fraction === 1 ? 'fill-copper' : 'fill-ink'}
          />
        ))}
      </svg>
      <span className="font-bold leading-none tracking-wordmark text-ink">
        Ion<span className="font-normal">folio</span>
      </span>
    </span>
  );
}
