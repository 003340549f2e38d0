import Link from "next/link";
import { requirePage } from "@/lib/server/session";
import { getDb } from "@/db";
import { listWorksPage, worksCursorParam, worksCursorText } from "@/db/queries/works-list";
import { plural } from "@/lib/vocabulary";
import { EmptyState } from "@/components/ui/empty-state";
import { WorksTable } from "@/components/works/works-table";

export const metadata = { title: "Works" };

const PAGE = 50;

export default async function WorksPage({ searchParams }: { searchParams: Promise<{ q?: string; after?: string }> }) {
  await requirePage("corpus:read");
  const { q: rawQ, after: rawAfter } = await searchParams;
  const q = rawQ?.slice(0, 200);
  const after = worksCursorParam.safeParse(rawAfter ?? "");
  const { rows, next } = await listWorksPage(getDb(), {
    q,
    after: after.success ? after.data : undefined,
    limit: PAGE,
  });
  const link = (extra: Record<string, string>) =>
    `/works?${new URLSearchParams({ ...(q ? { q } : {}), ...extra }).toString()}`;
  const firstPage = !after.success;
  return (
    <div className="grid gap-4">
      <h1 className="font-serif text-3xl font-semibold">Works</h1>
      <form role="search" className="flex flex-wrap items-end gap-2">
        <label className="grid gap-1 text-sm">
          <span>Search title or first author</span>
          <input name="q" defaultValue={q} className="rounded border border-rule bg-paper px-2 py-1" />
        </label>
        <button className="rounded border border-ink px-3 py-1">Search</button>
        {q && (
          <Link href="/works" className="text-sm underline">
            Clear the search
          </Link>
        )}
      </form>
      {rows.length === 0 ? (
        q ? (
          <EmptyState title="No work matches this search">
            Try part of the title or the first author&apos;s surname.
          </EmptyState>
        ) : (
          <EmptyState title="No works yet" action={{ href: "/dashboards", label: "Open the dashboards" }}>
            Works appear once mined articles&apos; references are resolved.
          </EmptyState>
        )
      ) : (
        <>
          <p className="text-sm text-ink-2">Most cited first.</p>
          <WorksTable
            rows={rows}
            summary={`${firstPage ? "First" : "This"} page: ${plural(rows.length, "work")}${next ? ", more on the next page" : ""}.`}
          />
          <nav className="flex gap-4 text-sm" aria-label="Pages of works">
            {!firstPage && (
              <Link className="underline" href={link({})}>
                ← First page
              </Link>
            )}
            {next && (
              <Link className="underline" href={link({ after: worksCursorText(next) })}>
                Next page →
              </Link>
            )}
          </nav>
        </>
      )}
    </div>
  );
}
