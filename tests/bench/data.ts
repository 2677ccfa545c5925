/**
 * Data benchmark (not a test): `npm run bench:data`.
 * Fills a throwaway SQLite database in a temp folder with 100 bridges, measures, grows it to 10,000
 * bridges (three revisions each, 20 field checks and 2 photo records per bridge: 200,000 checks and
 * 20,000 photos at the large size, with the audit events those writes leave) and measures again:
 *  - the portfolio API (GET /api/bridges through its route handler with a signed session: first page,
 *    a search, a district filter, the "out of tolerance" filter, and the fifth page by cursor). The
 *    search and the two filters ask for a page of 8 rows, a page both sizes fill (the small database
 *    holds 10 bridges matching the search, 9 in the district and 10 with a failure): at the default
 *    100 rows the small database would answer 8–10 rows and the large one 100, and the ratio would
 *    measure the length of the answer instead of the cost of finding it;
 *  - the portfolio page (the page's reads plus the server render of its filter form and table);
 *  - one bridge's checks page (the page's reads: checks with photos, attachments, audit, sign-off state);
 *  - one bridge's audit log (GET /api/bridges/:id/audit through its route handler).
 * Each figure is the fastest of 40 runs after 3 warm-ups (the machine is shared; the fastest run is the
 * one least disturbed by other work), with the median beside it and the rows each measure answers
 * with at both sizes. Target: every 10,000-bridge figure
 * within 2× of its 100-bridge figure (indexes and keyset pages, no whole-table reads). Prints the ratios.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { NextRequest } from 'next/server';
import { CHECKS_PER_BRIDGE, PHOTOS_PER_BRIDGE, fillBridges } from './data-fill';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-bench-data-'));
process.env.DATA_DIR = dir;
process.env.CHORDLINE_NO_DEMO = '1';
process.env.NEXTAUTH_SECRET = 'bench-secret-for-a-throwaway-database';
process.env.NEXTAUTH_URL = 'http://localhost:3000';
// React's production build, as the served app renders with (loaded below, after this is set).
(process.env as Record<string, string>).NODE_ENV = 'production';

// Many cheap runs: on a busy machine the fastest of many is the one least disturbed (BENCH_RUNS to change).
const RUNS = Number(process.env.BENCH_RUNS) || 40;
const WARM = 3;

/** Rows in a measure's answer: the JSON array's length, or the `rows` a measure reports; null otherwise. */
function rowsOf(result: unknown): number | null {
  if (result && typeof result === 'object' && 'rows' in result && typeof result.rows === 'number') return result.rows;
  if (result && typeof result === 'object' && 'body' in result && typeof result.body === 'string') {
    const parsed: unknown = JSON.parse(result.body);
    return Array.isArray(parsed) ? parsed.length : null;
  }
  return null;
}

/** Fastest and median of RUNS timed runs (ms) after WARM untimed ones. */
async function time(work: () => Promise<unknown>): Promise<{ fastest: number; median: number }> {
  for (let i = 0; i < WARM; i++) await work();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t = process.hrtime.bigint();
    await work();
    times.push(Number(process.hrtime.bigint() - t) / 1e6);
  }
  times.sort((a, b) => a - b);
  return { fastest: times[0], median: times[Math.floor(RUNS / 2)] };
}

async function main() {
  // Loaded after DATA_DIR is set: the connection reads it on first use.
  const { createElement } = await import('react');
  const { renderToString } = await import('react-dom/server');
  const { db, closeDb } = await import('../../lib/db/connection');
  const bridgesRoute = await import('../../app/api/bridges/route');
  const auditRoute = await import('../../app/api/bridges/[id]/audit/route');
  const { listBridgePage, listDistricts, bridgeListQuerySchema } = await import('../../lib/services/bridge-list');
  const { listChecks } = await import('../../lib/services/checks');
  const { listAttachments } = await import('../../lib/services/attachments');
  const { bridgeAudit } = await import('../../lib/services/field-audit');
  const { signOffOverview } = await import('../../lib/services/signoff');
  const { Bridge } = await import('../../models');
  const PortfolioTable = (await import('../../components/bridges/PortfolioTable')).default;
  const PortfolioFilters = (await import('../../components/bridges/PortfolioFilters')).default;

  const { makeUsers } = await import('../api/helpers');

  const sequelize = await db();
  // Signed-in sessions made the way the API tests make them (real users, signed session cookies).
  const { engineer } = await makeUsers();
  const user = { id: engineer.id };
  const cookie = engineer.cookie;

  const api = async (handler: unknown, url: string, params: Record<string, string> = {}) => {
    const req = new NextRequest(new URL(url, 'http://localhost:3000'), { headers: { cookie } });
    const res = await (handler as (r: NextRequest, c: { params: Promise<Record<string, string>> }) => Promise<Response>)(req, { params: Promise.resolve(params) });
    if (res.status !== 200) throw new Error(`${url} answered ${res.status}: ${await res.text()}`);
    return { body: await res.text(), next: res.headers.get('X-Next-Cursor') };
  };
  const fifthPage = async () => {
    let cursor: string | null = null;
    let last: { body: string; next: string | null } | null = null;
    for (let i = 0; i < 5; i++) {
      last = await api(bridgesRoute.GET, `/api/bridges?limit=20${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`);
      cursor = last.next;
    }
    return last;
  };
  const page = async () => {
    const query = bridgeListQuerySchema.parse({});
    const [rows, districts] = await Promise.all([listBridgePage(query), listDistricts()]);
    const html = renderToString(createElement('div', null, createElement(PortfolioFilters, { query, districts }), createElement(PortfolioTable, { rows: rows.rows })));
    return { html, rows: rows.rows.length };
  };
  const checksPage = async () => {
    const bridge = await Bridge.findByPk(1);
    return Promise.all([listChecks(bridge!.id), listAttachments('1'), bridgeAudit('1'), signOffOverview('1')]);
  };

  const cases: [string, () => Promise<unknown>][] = [
    ['portfolio API, first page (100 rows)', () => api(bridgesRoute.GET, '/api/bridges')],
    ['portfolio API, search "BN-0004" (page of 8)', () => api(bridgesRoute.GET, '/api/bridges?q=BN-0004&limit=8')],
    ['portfolio API, one district (page of 8)', () => api(bridgesRoute.GET, '/api/bridges?district=Coast&limit=8')],
    ['portfolio API, out-of-tolerance filter (page of 8)', () => api(bridgesRoute.GET, '/api/bridges?attention=failures&limit=8')],
    ['portfolio API, fifth page of 20 by cursor', fifthPage],
    ['portfolio page (reads + server render)', page],
    ['one bridge: checks page reads', checksPage],
    ['one bridge: audit log API', () => api(auditRoute.GET, '/api/bridges/1/audit', { id: '1' })],
  ];

  const results = new Map<string, { fastest: number; median: number; rows: number | null }[]>();
  const sizes = [100, 10_000];
  let filled = 0;
  for (const size of sizes) {
    const t = Date.now();
    await fillBridges(sequelize, filled + 1, size, user.id);
    filled = size;
    await sequelize.query('ANALYZE');
    console.log(
      `filled ${size.toLocaleString('en-US')} bridges (${(size * 3).toLocaleString('en-US')} revisions, ${(size * CHECKS_PER_BRIDGE).toLocaleString('en-US')} checks, ${(size * PHOTOS_PER_BRIDGE).toLocaleString('en-US')} photo records) in ${((Date.now() - t) / 1000).toFixed(1)} s`,
    );
    for (const [name, work] of cases) {
      const ms = await time(work);
      results.set(name, [...(results.get(name) ?? []), { ...ms, rows: rowsOf(await work()) }]);
    }
  }

  if (process.env.BENCH_PLANS) await printPlans(sequelize, cases);
  console.log('\n| measure | rows answered (100 / 10,000) | 100 bridges: fastest (median) ms | 10,000 bridges: fastest (median) ms | ratio of fastest |');
  console.log('| --- | ---: | ---: | ---: | ---: |');
  let worst = 0;
  for (const [name, [small, large]] of results) {
    const ratio = large.fastest / small.fastest;
    worst = Math.max(worst, ratio);
    const rows = small.rows === null ? '–' : `${small.rows} / ${large.rows}`;
    console.log(`| ${name} | ${rows} | ${small.fastest.toFixed(2)} (${small.median.toFixed(2)}) | ${large.fastest.toFixed(2)} (${large.median.toFixed(2)}) | ${ratio.toFixed(2)} |`);
  }
  console.log(
    `load average at the end: ${os
      .loadavg()
      .map((l) => l.toFixed(1))
      .join(', ')} on ${os.cpus().length} cores`,
  );
  console.log(`\nworst ratio ${worst.toFixed(2)} (target under 2): ${worst < 2 ? 'met' : 'NOT met'}`);
  await closeDb();
  fs.rmSync(dir, { recursive: true, force: true });
}

/** With BENCH_PLANS=1: SQLite's plan for every SELECT each measure runs (on the large database). */
async function printPlans(sequelize: import('sequelize').Sequelize, cases: [string, () => Promise<unknown>][]) {
  const seen: string[] = [];
  // Sequelize keeps its options on the instance at run time; its types do not declare them.
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  const logging = options.logging;
  options.logging = (sql: string) => seen.push(sql.replace(/^Executing \([^)]*\): /, ''));
  for (const [name, work] of cases) {
    seen.length = 0;
    await work();
    console.log(`\n${name}`);
    for (const sql of seen.filter((q) => /^(SELECT|WITH)/i.test(q))) {
      const [plan] = await sequelize.query(`EXPLAIN QUERY PLAN ${sql}`);
      console.log(`  ${sql.slice(0, 160)}\n    ${(plan as { detail: string }[]).map((p) => p.detail).join(' | ')}`);
    }
  }
  options.logging = logging;
}

main().catch((err) => {
  console.error(err);
  fs.rmSync(dir, { recursive: true, force: true });
  process.exit(1);
});
