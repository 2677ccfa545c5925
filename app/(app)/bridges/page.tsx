import type { Metadata } from 'next';
import Link from 'next/link';
import PageHeader from '@/components/PageHeader';
import PortfolioEmpty from '@/components/bridges/PortfolioEmpty';
import PortfolioFilters from '@/components/bridges/PortfolioFilters';
import PortfolioTable from '@/components/bridges/PortfolioTable';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { bridgeListQuerySchema, listBridgePage, listDistricts } from '@/lib/services/bridge-list';

export const metadata: Metadata = { title: 'Bridges' };

type Search = Promise<Record<string, string | string[] | undefined>>;

/** The query string as the list schema reads it: one value per parameter, blanks left out. */
function plain(search: Record<string, string | string[] | undefined>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(search)) {
    const one = Array.isArray(v) ? v[0] : v;
    if (one !== undefined && one.trim() !== '') out[k] = one;
  }
  return out;
}

function pageHref(query: Record<string, string>, cursor: string | null): string {
  const params = new URLSearchParams({ ...query });
  params.delete('cursor');
  if (cursor) params.set('cursor', cursor);
  const text = params.toString();
  return text ? `/bridges?${text}` : '/bridges';
}

/**
 * The portfolio: every bridge a district keeps, searched, filtered and paged on the server (one page
 * of at most 100 rows read through the bridges table's indexes), with each bridge's check progress.
 */
export default async function BridgesPage({ searchParams }: { searchParams: Search }) {
  const raw = plain(await searchParams);
  const user = await requireUser(`/bridges${Object.keys(raw).length ? `?${new URLSearchParams(raw)}` : ''}`);
  const canCreate = roleAllows(user.role, ['engineer']);
  const parsed = bridgeListQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : bridgeListQuerySchema.parse({});
  const [page, districts] = await Promise.all([listBridgePage(query).catch(() => listBridgePage({ ...query, cursor: undefined })), listDistricts()]);
  const filtered = Boolean(query.q || query.stage || query.district || query.attention);
  const { cursor: _cursor, ...kept } = raw;
  return (
    <>
      <PageHeader
        title="Bridges"
        subtitle="Each bridge's stage, how many brackets pass their latest checks, spans signed off and out-of-tolerance checks still open."
        actions={
          canCreate ? (
            <Link href="/bridges/new" className="btn-primary">
              New bridge
            </Link>
          ) : null
        }
      />
      <PortfolioFilters query={query} districts={districts} />
      {!parsed.success ? (
        <p role="alert" className="mb-4 rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          Some of the filters in the address were not understood, so every bridge is shown. Choose the filters again above.
        </p>
      ) : null}
      {page.rows.length === 0 ? (
        <PortfolioEmpty filtered={filtered} canCreate={canCreate} />
      ) : (
        <>
          <p className="mb-2 text-sm text-concrete-600" aria-live="polite">
            {page.rows.length} {page.rows.length === 1 ? 'bridge' : 'bridges'}
            {filtered ? ' matching the filters' : ''} on this page{page.nextCursor ? '; more on the next page' : ''}.
          </p>
          <PortfolioTable rows={page.rows} />
          <nav aria-label="Pages" className="mt-4 flex flex-wrap gap-2">
            {query.cursor ? (
              <Link href={pageHref(kept, null)} className="btn-secondary">
                Back to the first page
              </Link>
            ) : null}
            {page.nextCursor ? (
              <Link href={pageHref(kept, page.nextCursor)} className="btn-secondary" rel="next">
                Next page
              </Link>
            ) : null}
          </nav>
        </>
      )}
    </>
  );
}
