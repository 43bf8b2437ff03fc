import { useState } from 'react';
import { currentTheme, storeTheme, type Theme } from '../../lib/theme';

/** Switches between the paper (light) and night (dark) themes and remembers the choice. */
export function ThemeToggle() {
  const [theme, setTheme] = useState<Theme>(currentTheme);
  const next: Theme = theme === 'dark' ? 'light' : 'dark';
  return (
    <button
      type="button"
      className="rounded-md px-2 py-1.5 text-sm text-ink-soft hover:bg-paper-sunk hover:text-ink"
      aria-pressed={theme === 'dark'}
      title={`Switch to the ${next} theme`}
      onClick={() => {
        storeTheme(next);
        setTheme(next);
      }}
    >
      Dark theme
    </button>
  );
}
