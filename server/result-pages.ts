// GET /api/v1/results' two ways of paging. Numbered pages (page=1…RESULT_PAGE_CAP) keep an exact total and the
// data cache; pages by key (after=<id>) read "id > after ORDER BY id LIMIT size" through the results (status, id)
// index, so page 5,000 costs what page 1 costs, and their total is PostgreSQL's planner estimate, said as such.
// links.next always reads by key, so a client that follows it never meets the page cap, and results approved
// while it reads (new ids are always higher) appear at the end instead of shifting every later page.
import "server-only";
import { estimatePublishedResults, listResultsAfter } from "@/db/queries/open-data/results";
import type { ResultWhere } from "@/db/queries/open-data/where";
import { RESULT_PAGE_CAP, type ResultFilters } from "@/lib/api-contract/queries";
import type { ResultFlatRow } from "@/lib/open-data/records";
import { pageOf } from "@/server/api";
import { cachedApiResultsPage } from "@/server/public-data";

type Asked = { page?: number; size: number; after?: number };
type ResultPage = {
  rows: ResultFlatRow[];
  meta: Record<string, unknown>;
  links: Record<string, string | null>;
  headers: Record<string, string>;
};

/** The request's path with page/after replaced (the other filters and size kept). */
function linkTo(req: Request, size: number, at: { page: number } | { after: number }): string {
  const u = new URL(req.url);
  u.searchParams.delete("page");
  u.searchParams.delete("after");
  if ("page" in at) u.searchParams.set("page", String(at.page));
  else u.searchParams.set("after", String(at.after));
  u.searchParams.set("size", String(size));
  return `${u.pathname}${u.search}`;
}

export async function resultsPage(
  req: Request,
  asked: Asked,
  filters: ResultFilters,
  where: ResultWhere,
): Promise<ResultPage> {
  const { size, after } = asked;
  if (after !== undefined) {
    const [{ rows, hasMore }, estimate] = await Promise.all([
      listResultsAfter(where, { after, size }),
      estimatePublishedResults(where),
    ]);
    const last = rows.at(-1);
    return {
      rows,
      meta: { size, total: Math.max(estimate, rows.length), totalIsEstimate: true, after },
      links: {
        self: linkTo(req, size, { after }),
        first: linkTo(req, size, { page: 1 }),
        last: null,
        next: hasMore && last ? linkTo(req, size, { after: last.id }) : null,
        prev: null,
      },
      headers: {},
    };
  }
  const page = asked.page ?? 1;
  const { rows, total } = await cachedApiResultsPage(filters, where, { page, size });
  const env = pageOf(req, { page, size }, total);
  const last = rows.at(-1);
  return {
    rows,
    meta: { ...env.meta, totalIsEstimate: false },
    links: {
      ...env.links,
      last: env.meta.pageCount <= RESULT_PAGE_CAP ? env.links.last : null,
      next: page < env.meta.pageCount && last ? linkTo(req, size, { after: last.id }) : null,
    },
    headers: env.headers,
  };
}
