import { PageHeader } from '../../../components/ui/page-header';
import { OverviewCharts } from '../../../features/overview/components/overview-charts';

export default function OverviewPage() {
  return (
    <section>
      <PageHeader
        title="Overview"
        description="The library in numbers: entries by state, growth by month, nominal masses, elements, checks that need attention and how long reviews take."
      />
      <OverviewCharts />
    </section>
  );
}
