/** The sorts the library list offers (the API's `sort`), and which way. */
export type LibrarySort = 'relevance' | 'accession' | 'name' | 'nominalMass' | 'updatedAt';
export type SortOrder = 'asc' | 'desc';

/** The server-side filters of the library page, as text, exactly as they sit in the address. */
export type LibraryFilter = {
  q: string;
  formula: string;
  minMass: string;
  maxMass: string;
  elements: string;
  hasRetentionIndex: '' | 'true' | 'false';
  status: 'published' | 'withdrawn' | 'any';
  contributor: string;
  edition: string;
  sort: LibrarySort | '';
  order: SortOrder | '';
};

const TEXT_KEYS = ['q', 'formula', 'minMass', 'maxMass', 'elements', 'contributor', 'edition'] as const;
const SORTS: readonly LibrarySort[] = ['relevance', 'accession', 'name', 'nominalMass', 'updatedAt'];

export const emptyFilter: LibraryFilter = {
  q: '',
  formula: '',
  minMass: '',
  maxMass: '',
  elements: '',
  hasRetentionIndex: '',
  status: 'published',
  contributor: '',
  edition: '',
  sort: '',
  order: '',
};

/** Reads the filters from the page's search params; anything unknown falls back to its default. */
export function filterFromParams(params: URLSearchParams): LibraryFilter {
  const filter: LibraryFilter = { ...emptyFilter };
  for (const key of TEXT_KEYS) filter[key] = params.get(key)?.trim() ?? '';
  const ri = params.get('hasRetentionIndex');
  filter.hasRetentionIndex = ri === 'true' || ri === 'false' ? ri : '';
  const status = params.get('status');
  filter.status = status === 'withdrawn' || status === 'any' ? status : 'published';
  const sort = params.get('sort') as LibrarySort | null;
  filter.sort = sort && SORTS.includes(sort) ? sort : '';
  const order = params.get('order');
  filter.order = order === 'asc' || order === 'desc' ? order : '';
  return filter;
}

/** The filters as search params, leaving out what is at its default (short, shareable addresses). */
export function filterToParams(filter: LibraryFilter): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of TEXT_KEYS) if (filter[key].trim()) params.set(key, filter[key].trim());
  if (filter.hasRetentionIndex) params.set('hasRetentionIndex', filter.hasRetentionIndex);
  if (filter.status !== 'published') params.set('status', filter.status);
  // Relevance ranks by the name filter; without one the API would refuse it.
  if (filter.sort && !(filter.sort === 'relevance' && !filter.q.trim())) params.set('sort', filter.sort);
  if (filter.order) params.set('order', filter.order);
  return params;
}

/** The sort in force: the one chosen, else what the API defaults to (relevance with a name, else accession). */
export function effectiveSort(filter: LibraryFilter): { sort: LibrarySort; order: SortOrder } {
  const sort = filter.sort || (filter.q ? 'relevance' : 'accession');
  return { sort, order: filter.order || (sort === 'relevance' ? 'desc' : 'asc') };
}

/** Clicking a column header: the first click sorts ascending, the next flips the order. */
export function toggleSort(filter: LibraryFilter, sort: LibrarySort): LibraryFilter {
  const current = effectiveSort(filter);
  const order: SortOrder = current.sort === sort && current.order === 'asc' ? 'desc' : 'asc';
  return { ...filter, sort, order };
}

/** True when any server-side filter narrows the list (the sort alone does not). */
export function isFiltered(filter: LibraryFilter): boolean {
  return TEXT_KEYS.some((key) => filter[key] !== '') || filter.hasRetentionIndex !== '' || filter.status !== 'published';
}
