import Link from 'next/link';
import { STAGES, STAGE_LABELS } from '@/lib/services/bridge-record';
import type { BridgeListQuery } from '@/lib/services/bridge-list';
import FilterSelect, { type FilterOption } from '@/components/bridges/FilterSelect';

const SORT_OPTIONS: FilterOption[] = [
  { value: 'activity', label: 'Latest activity' },
  { value: 'name', label: 'Name A–Z' },
  { value: 'structure', label: 'Structure no.' },
];
const ATTENTION_OPTIONS: FilterOption[] = [
  { value: 'failures', label: 'Out-of-tolerance checks' },
  { value: 'signoff', label: 'Spans waiting for sign-off' },
];

/**
 * The portfolio's search and filters as a plain GET form: the server does the searching, so it works
 * before any script has loaded and every filtered list has its own address to bookmark or share.
 */
export default function PortfolioFilters({ query, districts }: { query: Partial<BridgeListQuery>; districts: string[] }) {
  // A district in the address that no bridge holds any more stays selectable, so the form shows what was asked.
  const districtOptions = query.district && !districts.includes(query.district) ? [...districts, query.district] : districts;
  return (
    <form
      method="get"
      action="/bridges"
      role="search"
      aria-label="Search and filter bridges"
      className="card mb-4 grid grid-cols-2 gap-3 p-4 lg:grid-cols-[minmax(0,2fr)_repeat(4,minmax(0,1fr))_auto]"
    >
      <div className="col-span-2 lg:col-span-1">
        <label htmlFor="portfolio-q" className="field-label">
          Search
        </label>
        <input id="portfolio-q" name="q" type="search" defaultValue={query.q ?? ''} maxLength={100} placeholder="Name, structure number or route" className="field-input mt-1 py-1.5" />
      </div>
      <FilterSelect name="stage" label="Stage" value={query.stage ?? ''} anyLabel="Any stage" options={STAGES.map((s) => ({ value: s, label: STAGE_LABELS[s] }))} />
      <FilterSelect name="district" label="District" value={query.district ?? ''} anyLabel="All districts" options={districtOptions.map((d) => ({ value: d, label: d }))} />
      <FilterSelect name="attention" label="Attention" value={query.attention ?? ''} anyLabel="Every bridge" options={ATTENTION_OPTIONS} />
      <FilterSelect name="sort" label="Order" value={query.sort ?? 'activity'} options={SORT_OPTIONS} />
      <div className="col-span-2 flex items-end gap-2 lg:col-span-1">
        <button type="submit" className="btn-primary">
          Show
        </button>
        <Link href="/bridges" className="btn-secondary">
          Clear
        </Link>
      </div>
    </form>
  );
}
