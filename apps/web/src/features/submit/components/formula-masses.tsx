import { formatFormula, monoisotopicMass, nominalMass, parseFormula, rdbe } from '@ionfolio/chem';

/** What a typed formula means: normalised, nominal and monoisotopic mass, rings plus double bonds. */
export function describeFormula(text: string): { formula: string; nominalMassDa: number; monoisotopicMassDa: number; rdbe: number } | null {
  if (text.trim() === '') return null;
  try {
    const counts = parseFormula(text);
    if (Object.keys(counts).length === 0) return null;
    return { formula: formatFormula(counts), nominalMassDa: nominalMass(counts), monoisotopicMassDa: monoisotopicMass(counts), rdbe: rdbe(counts) };
  } catch {
    return null;
  }
}

/** The live line under the formula field. */
export function FormulaMasses({ formula }: { formula: string }) {
  const described = describeFormula(formula);
  if (!described) return <span>Nominal and monoisotopic mass and RDBE appear as you type.</span>;
  return (
    <span data-testid="formula-masses" className="tabular-nums">
      {described.formula} · nominal mass {described.nominalMassDa} Da · monoisotopic {described.monoisotopicMassDa.toFixed(4)} Da · RDBE{' '}
      {described.rdbe}
    </span>
  );
}
