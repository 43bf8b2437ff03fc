export type Theme = 'light' | 'dark';

const storageKey = 'ionfolio-theme';

/** The theme the person chose on this browser, or null when they never chose. */
export function readStoredTheme(): Theme | null {
  try {
    const value = window.localStorage.getItem(storageKey);
    return value === 'light' || value === 'dark' ? value : null;
  } catch {
    return null;
  }
}

/** The theme in effect: the stored choice, else the system's preference. */
export function currentTheme(): Theme {
  const stored = readStoredTheme();
  if (stored) return stored;
  return window.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'light';
}

/** Marks the document so the CSS variables of tailwind.config.ts switch (no mark: follow the system). */
export function applyTheme(theme: Theme | null): void {
  if (theme) document.documentElement.dataset.theme = theme;
  else delete document.documentElement.dataset.theme;
}

export function storeTheme(theme: Theme): void {
  try {
    window.localStorage.setItem(storageKey, theme);
  } catch {
    // Private windows may refuse storage; the choice then lasts for this page only.
  }
  applyTheme(theme);
}
