import { PageHeader } from '../../../components/ui/page-header';
import { IsotopeCalculator } from '../../../features/formula-tools/components/isotope-calculator';

export default function IsotopeCalculatorPage() {
  return (
    <section>
      <PageHeader
        title="Isotope calculator"
        description="Nominal and monoisotopic mass, rings plus double bonds, the nitrogen rule and the isotope cluster of a formula, computed in this browser."
      />
      <IsotopeCalculator />
    </section>
  );
}
