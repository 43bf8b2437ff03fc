import { useEffect, useState } from 'react';

/** The theme tokens a chart draws with, read from the CSS variables of tailwind.config.ts. */
export type ChartColors = {
  ink: string;
  inkSoft: string;
  rule: string;
  ruleFaint: string;
  copper: string;
  paperRaised: string;
};

const fallback: ChartColors = {
  ink: '#1b2945',
  inkSoft: '#4b5873',
  rule: '#8d99b0',
  ruleFaint: '#d9d3c5',
  copper: '#a4541d',
  paperRaised: '#fcfaf5',
};

function read(style: CSSStyleDeclaration, name: string, otherwise: string): string {
  const value = style.getPropertyValue(`--if-${name}`).trim();
  return value === '' ? otherwise : value;
}

/** The current values of the theme's CSS variables (canvas charts cannot use `var(...)` themselves). */
export function readChartColors(): ChartColors {
  const style = getComputedStyle(document.documentElement);
  return {
    ink: read(style, 'ink', fallback.ink),
    inkSoft: read(style, 'ink-soft', fallback.inkSoft),
    rule: read(style, 'rule', fallback.rule),
    ruleFaint: read(style, 'rule-faint', fallback.ruleFaint),
    copper: read(style, 'copper', fallback.copper),
    paperRaised: read(style, 'paper-raised', fallback.paperRaised),
  };
}

/** Chart colours that follow the theme switch (the `data-theme` mark) and the system preference. */
export function useThemeColors(): ChartColors {
  const [colors, setColors] = useState<ChartColors>(readChartColors);
  useEffect(() => {
    const update = () => setColors(readChartColors());
    const observer = new MutationObserver(update);
    observer.observe(document.documentElement, { attributes: true, attributeFilter: ['data-theme'] });
    const media = window.matchMedia?.('(prefers-color-scheme: dark)');
    media?.addEventListener('change', update);
    return () => {
      observer.disconnect();
      media?.removeEventListener('change', update);
    };
  }, []);
  return colors;
}
