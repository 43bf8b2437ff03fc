import { useSearchParams } from 'react-router-dom';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { LibraryFilters } from '../../../features/library/components/library-filters';
import { LibraryView } from '../../../features/library/components/library-view';
import { StructureSearch } from '../../../features/library/components/structure-search';
import { filterFromParams, filterToParams, toggleSort, type LibraryFilter } from '../../../features/library/utils/library-filter';

export default function LibraryPage() {
  const [params, setParams] = useSearchParams();
  const filter = filterFromParams(params);
  const smiles = params.get('smiles') ?? '';
  const mode = params.get('match') === 'exact' ? 'exact' : 'substructure';
  // The structure search lives in the address too, beside the filters, so either can be shared.
  const go = (next: LibraryFilter, structure = { smiles, mode }) => {
    const search = filterToParams(next);
    if (structure.smiles) {
      search.set('smiles', structure.smiles);
      if (structure.mode === 'exact') search.set('match', 'exact');
    }
    setParams(search);
  };
  return (
    <section className="space-y-4">
      <PageHeader
        title="Library"
        description="Every published entry in one table. Filters run on the server over the whole library; quick find narrows the rows already loaded."
      />
      <LibraryFilters key={filterToParams(filter).toString()} filter={filter} onApply={(next) => go(next)} />
      <PanelErrorBoundary title="Structure search">
        <StructureSearch key={`${mode}:${smiles}`} smiles={smiles} mode={mode} onSearch={(s, m) => go(filter, { smiles: s, mode: m })} />
      </PanelErrorBoundary>
      <PanelErrorBoundary title="The library table">
        <LibraryView filter={filter} onSort={(sort) => go(toggleSort(filter, sort))} />
      </PanelErrorBoundary>
    </section>
  );
}
