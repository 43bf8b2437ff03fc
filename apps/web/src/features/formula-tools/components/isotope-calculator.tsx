import { useDeferredValue, useState } from 'react';
import { StickPlot } from '../../../components/spectrum/stick-plot';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { useServerFormula } from '../api/get-formula';
import { describeFormula, type FormulaFacts } from '../utils/describe-formula';

const headCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const cell = 'px-3 py-1 tabular-nums';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div className="rounded-lg border border-rule-faint bg-paper-raised px-4 py-2">
      <dt className="text-xs font-bold uppercase tracking-wider text-ink-soft">{label}</dt>
      <dd className="text-lg font-bold tabular-nums text-ink">{value}</dd>
    </div>
  );
}

function ServerComparison({ facts }: { facts: FormulaFacts }) {
  const server = useServerFormula(facts.formula);
  if (server.isPending) return <p role="status" className="text-sm text-ink-soft">Asking the server…</p>;
  if (server.isError) return <ErrorNotice title="The server could not compute the formula" error={server.error} />;
  const agreeMass = Math.abs(server.data.monoisotopicMass - facts.monoisotopicMassU) < 1e-6 && server.data.nominalMass === facts.nominalMassDa;
  const byMz = new Map(server.data.cluster.map((p) => [p.mz, p.relativeIntensity]));
  const worst = facts.cluster.reduce((max, p) => Math.max(max, Math.abs((byMz.get(p.mz) ?? 0) - p.relIntensity)), 0);
  return (
    <p role="status" className="text-sm text-ink">
      Server: {server.data.formula}, nominal {server.data.nominalMass}, monoisotopic {server.data.monoisotopicMass.toFixed(5)} u, RDBE {server.data.rdbe}
      {' — '}
      {agreeMass && worst < 0.05 ? 'agrees with this page.' : `differs (largest cluster difference ${worst.toFixed(2)} points).`}
    </p>
  );
}

/** Type a formula: masses, RDBE, the nitrogen rule and the isotope cluster as sticks and as a table. */
export function IsotopeCalculator({ initialFormula = 'C6H4Cl2' }: { initialFormula?: string }) {
  const [text, setText] = useState(initialFormula);
  const [compare, setCompare] = useState(false);
  const deferred = useDeferredValue(text);
  const result = deferred.trim() === '' ? null : describeFormula(deferred);
  const facts = result?.ok ? result.facts : null;
  const m = facts?.cluster.find((p) => p.mz === facts.nominalMassDa)?.relIntensity;

  return (
    <div className="grid gap-5">
      <label className="grid max-w-md gap-1">
        <span className="font-bold text-ink">Formula</span>
        <input
          className="rounded-md border border-rule bg-paper-raised px-3 py-2 font-mono text-ink hover:border-ink"
          value={text}
          spellCheck={false}
          placeholder="e.g. C6H4Cl2 or CH3(CH2)4OH"
          onChange={(e) => {
            setText(e.target.value);
            setCompare(false);
          }}
        />
        <span className="text-xs text-ink-soft">Element symbols with counts; brackets and spaces are allowed.</span>
      </label>
      {result && !result.ok ? (
        <p role="alert" className="text-sm font-bold text-copper">
          {result.error}
        </p>
      ) : null}
      {facts ? (
        <>
          <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <Fact label="Formula (Hill order)" value={facts.formula} />
            <Fact label="Nominal mass" value={`${facts.nominalMassDa} Da`} />
            <Fact label="Monoisotopic mass" value={`${facts.monoisotopicMassU.toFixed(5)} u`} />
            <Fact label="RDBE" value={String(facts.rdbe)} />
          </dl>
          <p className="text-sm text-ink" data-testid="nitrogen-rule">
            Nitrogen rule:{' '}
            {facts.nitrogenRuleHolds
              ? `holds — nominal mass ${facts.nominalMassDa} is ${facts.nominalMassDa % 2 === 0 ? 'even' : 'odd'} with ${facts.nitrogenCount} N.`
              : `does not hold — nominal mass ${facts.nominalMassDa} with ${facts.nitrogenCount} N: not a neutral molecule (an even-electron ion, like C7H7+).`}
            {Number.isInteger(facts.rdbe) ? '' : ' A half-integer RDBE means an even-electron ion.'}
          </p>
          <StickPlot peaks={facts.cluster.map((p) => [p.mz, p.relIntensity])} molecularIonMz={facts.nominalMassDa} label={`Isotope cluster of ${facts.formula}`} heightPx={260} />
          <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
            <table className="w-full border-collapse text-sm leading-7">
              <caption className="sr-only">Isotope cluster of {facts.formula}</caption>
              <thead className="border-b border-rule bg-paper-sunk">
                <tr>
                  <th scope="col" className={headCell}>m/z</th>
                  <th scope="col" className={headCell}>Peak</th>
                  <th scope="col" className={headCell}>Most intense = 100</th>
                  <th scope="col" className={headCell}>% of M</th>
                </tr>
              </thead>
              <tbody>
                {facts.cluster.map((p) => (
                  <tr key={p.mz} className="border-b border-rule-faint last:border-b-0">
                    <th scope="row" className={`${cell} text-left`}>{p.mz}</th>
                    <td className={`${cell} text-ink-soft`}>{p.mz === facts.nominalMassDa ? 'M' : `M${p.mz > facts.nominalMassDa ? '+' : '−'}${Math.abs(p.mz - facts.nominalMassDa)}`}</td>
                    <td className={cell}>{p.relIntensity.toFixed(2)}</td>
                    <td className={cell} data-testid={`of-m-${p.mz}`}>{m ? ((p.relIntensity / m) * 100).toFixed(1) : '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="grid gap-2">
            {compare ? (
              <ServerComparison facts={facts} />
            ) : (
              <Button variant="secondary" className="justify-self-start" onClick={() => setCompare(true)}>
                Compare with the server
              </Button>
            )}
            <p className="text-xs text-ink-soft">
              Isotope masses and abundances: NIST atomic weights and isotopic compositions (AME 2016, IUPAC/CIAAW); peaks below{' '}
              0.05 % of the most intense are left out.
            </p>
          </div>
        </>
      ) : null}
    </div>
  );
}
