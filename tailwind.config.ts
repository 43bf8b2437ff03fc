import type { Config } from 'tailwindcss';
import plugin from 'tailwindcss/plugin';

/**
 * Ionfolio's own palette: paper-like ground, deep ink-blue text and rules, one copper accent for what
 * matched or needs attention. Every colour utility reads a CSS variable so the dark theme is a swap of
 * values, not a second set of class names.
 */
export const palette = {
  light: {
    paper: '#f6f2e9',
    'paper-raised': '#fcfaf5',
    'paper-sunk': '#ece6d9',
    ink: '#1b2945',
    'ink-soft': '#4b5873',
    rule: '#8d99b0',
    'rule-faint': '#d9d3c5',
    copper: '#a4541d',
    'copper-soft': '#f1e0cf',
    'on-copper': '#fcfaf5',
    focus: '#a4541d',
  },
  dark: {
    paper: '#131924',
    'paper-raised': '#1a2231',
    'paper-sunk': '#0f141d',
    ink: '#ebe5d8',
    'ink-soft': '#a9b2c4',
    rule: '#5d6a85',
    'rule-faint': '#2b3445',
    copper: '#dd915a',
    'copper-soft': '#3a2a1f',
    'on-copper': '#131924',
    focus: '#dd915a',
  },
} as const;

type TokenName = keyof typeof palette.light;

const tokenNames = Object.keys(palette.light) as TokenName[];

function cssVariables(values: Record<TokenName, string>): Record<string, string> {
  return Object.fromEntries(tokenNames.map((name) => [`--if-${name}`, values[name]]));
}

export default {
  content: ['./index.html', './apps/web/src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: Object.fromEntries(tokenNames.map((name) => [name, `var(--if-${name})`])),
      fontFamily: {
        sans: ['Lato', 'system-ui', 'sans-serif'],
      },
      maxWidth: {
        page: '80rem',
      },
      letterSpacing: {
        wordmark: '0.04em',
      },
    },
  },
  plugins: [
    plugin(({ addBase }) => {
      addBase({
        ':root': { ...cssVariables(palette.light), 'color-scheme': 'light' },
        // With no stored choice the system preference decides; an explicit choice wins either way.
        '@media (prefers-color-scheme: dark)': {
          ':root:not([data-theme="light"])': { ...cssVariables(palette.dark), 'color-scheme': 'dark' },
        },
        ':root[data-theme="dark"]': { ...cssVariables(palette.dark), 'color-scheme': 'dark' },
      });
    }),
  ],
} satisfies Config;
