import Link from 'next/link';
import { STAGES, STAGE_LABELS } from '@/lib/services/bridge-record';
import type { BridgeListQuery } from '@/lib/services/bridge-list';

const SORT_LABELS = { activity: 'Latest activity', name: 'Name A–Z', structure: 'Structure no.' } as const;

/**
 * The portfolio's search and filters as a plain GET form: the server does the searching, so it works
 * before any script has loaded and every filtered list has its own address to bookmark or share.
 */
export default function PortfolioFilters({ query, districts }: { query: Partial<BridgeListQuery>; districts: string[] }) {
  const select = 'field-input mt-1 py-1.5';
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
      <div>
        <label htmlFor="portfolio-stage" className="field-label">
          Stage
        </label>
        <select id="portfolio-stage" name="stage" defaultValue={query.stage ?? ''} className={select}>
          <option value="">Any stage</option>
          {STAGES.map((s) => (
            <option key={s} value={s}>
              {STAGE_LABELS[s]}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="portfolio-district" className="field-label">
          District
        </label>
        <select id="portfolio-district" name="district" defaultValue={query.district ?? ''} className={select}>
          <option value="">All districts</option>
          {districts.map((d) => (
            <option key={d} value={d}>
              {d}
            </option>
          ))}
          {query.district && !districts.includes(query.district) ? <option value={query.district}>{query.district}</option> : null}
        </select>
      </div>
      <div>
        <label htmlFor="portfolio-attention" className="field-label">
          Attention
        </label>
        <select id="portfolio-attention" name="attention" defaultValue={query.attention ?? ''} className={select}>
          <option value="">Every bridge</option>
          <option value="failures">Out-of-tolerance checks</option>
          <option value="signoff">Spans waiting for sign-off</option>
        </select>
      </div>
      <div>
        <label htmlFor="portfolio-sort" className="field-label">
          Order
        </label>
        <select id="portfolio-sort" name="sort" defaultValue={query.sort ?? 'activity'} className={select}>
          {Object.entries(SORT_LABELS).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </select>
      </div>
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
