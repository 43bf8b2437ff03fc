import { useState } from 'react';
import { currentTheme, storeTheme, type Theme } from '../../lib/theme';

/** Switches between the paper (light) and night (dark) themes and remembers the choice. */
export function ThemeToggle() {
  const [theme, setTheme] = useState<Theme>(currentTheme);
  const next: Theme = theme === 'dark' ? 'light' : 'dark';
  return (
    <button
      type="button"
      className="inline-flex items-center gap-2 rounded-md px-2 py-1.5 text-sm text-ink-soft hover:bg-paper-sunk hover:text-ink"
      aria-pressed={theme === 'dark'}
      title={`Switch to the ${next} theme`}
      onClick={() => {
        storeTheme(next);
        setTheme(next);
      }}
    >
      <span
        aria-hidden="true"
        className={`relative h-3.5 w-6 rounded-full border border-rule transition-colors ${theme === 'dark' ? 'bg-ink-soft' : 'bg-paper-sunk'}`}
      >
        <span
          className={`absolute top-px h-2.5 w-2.5 rounded-full bg-paper-raised shadow-sm transition-[left] ${theme === 'dark' ? 'left-[11px]' : 'left-px'}`}
        />
      </span>
      Dark theme
    </button>
  );
}
