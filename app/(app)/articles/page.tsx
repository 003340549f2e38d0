import Link from "next/link";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { ArticleFilters, ARTICLE_STATUSES, listArticles } from "@/lib/corpus/articles";
import { listVenues } from "@/db/queries/venues";
import { EmptyState } from "@/components/ui/empty-state";
import { LABELS } from "@/lib/vocabulary";

export const metadata = { title: "Articles" };

export default async function ArticlesPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePage("corpus:read");
  const sp = await searchParams;
  const raw = Object.fromEntries(Object.entries(sp).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = ArticleFilters.safeParse(raw);
  const filters = parsed.success ? parsed.data : ArticleFilters.parse({});
  const db = getDb();
  const [{ articles, hasMore, page }, venues] = await Promise.all([listArticles(db, filters), listVenues(db)]);
  const filtered = !!(filters.status || filters.venue || filters.year || filters.q);
  const qs = (p: number) => new URLSearchParams({ ...(raw as Record<string, string>), page: String(p) }).toString();
  return (
    <div className="grid gap-6">
      <h1 className="font-serif text-3xl font-semibold">Articles</h1>
      <form className="flex flex-wrap items-end gap-3" role="search">
        <label className="grid gap-1 text-sm">
          <span>Title contains</span>
          <input name="q" defaultValue={filters.q ?? ""} className="rounded border border-rule bg-paper px-2 py-1" />
        </label>
        <label className="grid gap-1 text-sm">
          <span>Status</span>
          <select
            name="status"
            defaultValue={filters.status ?? ""}
            className="rounded border border-rule bg-paper px-2 py-1"
          >
            <option value="">Any</option>
            {ARTICLE_STATUSES.map((s) => (
              <option key={s} value={s}>
                {LABELS.articleStatus[s]}
              </option>
            ))}
          </select>
        </label>
        <label className="grid gap-1 text-sm">
          <span>Venue</span>
          <select
            name="venue"
            defaultValue={filters.venue ?? ""}
            className="rounded border border-rule bg-paper px-2 py-1"
          >
            <option value="">Any</option>
            {venues.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name}
              </option>
            ))}
          </select>
        </label>
        <label className="grid gap-1 text-sm">
          <span>Year</span>
          <input
            name="year"
            inputMode="numeric"
            defaultValue={filters.year ?? ""}
            className="w-24 rounded border border-rule bg-paper px-2 py-1"
          />
        </label>
        <button className="rounded bg-ink px-3 py-1.5 text-paper">Filter</button>
        {filtered && (
          <Link href="/articles" className="text-sm underline">
            Clear filters
          </Link>
        )}
      </form>
      {!parsed.success && (
        <p className="text-accent" role="alert">
          Some filters were not understood and were ignored.
        </p>
      )}
      {articles.length === 0 ? (
        filtered ? (
          <EmptyState title="No article matches these filters">Loosen a filter or clear them all.</EmptyState>
        ) : (
          <EmptyState
            title="The corpus is empty"
            action={can(actor, "corpus:upload") ? { href: "/upload", label: "Upload articles" } : undefined}
          >
            {can(actor, "corpus:upload")
              ? "Upload PDFs, JATS XML or text files to start mining."
              : "A curator has not loaded any articles yet."}
          </EmptyState>
        )
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-rule text-left text-ink-2">
              <th className="py-1 pr-3 font-medium">Title</th>
              <th className="py-1 pr-3 font-medium">Venue</th>
              <th className="py-1 pr-3 font-medium">Year</th>
              <th className="py-1 pr-3 font-medium">Status</th>
              <th className="py-1 text-right font-medium">Statements</th>
            </tr>
          </thead>
          <tbody>
            {articles.map((a) => (
              <tr key={a.id} className="border-b border-rule align-top">
                <td className="py-1.5 pr-3">
                  <Link href={`/articles/${a.id}`} className="underline">
                    {a.title ?? a.original_filename}
                  </Link>
                  {a.is_demo && <span className="ml-2 text-xs text-ink-2">(invented demo)</span>}
                  {!a.licence && a.status === "done" && (
                    <span className="ml-2 text-xs text-accent">licence missing</span>
                  )}
                </td>
                <td className="py-1.5 pr-3">{a.venue ?? "—"}</td>
                <td className="py-1.5 pr-3 tabular-nums">{a.year ?? "—"}</td>
                <td className="py-1.5 pr-3">
                  {LABELS.articleStatus[a.status]}
                  {a.status === "failed" && a.failure_message && (
                    <span className="block text-xs text-ink-2">{a.failure_message}</span>
                  )}
                </td>
                <td className="py-1.5 text-right tabular-nums">{a.statements}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <nav className="flex gap-4 text-sm" aria-label="Pages">
        {page > 1 && <Link href={`/articles?${qs(page - 1)}`}>← Previous</Link>}
        {hasMore && <Link href={`/articles?${qs(page + 1)}`}>Next →</Link>}
      </nav>
    </div>
  );
}
