import Link from "next/link";
import { requirePage } from "@/lib/server/session";
import { getDb } from "@/db";
import { listWorks } from "@/lib/graph/work-detail";
import { EmptyState } from "@/components/ui/empty-state";

export default async function WorksPage({ searchParams }: { searchParams: Promise<{ q?: string }> }) {
  await requirePage("corpus:read");
  const { q } = await searchParams;
  const works = await listWorks(getDb(), { q: q?.slice(0, 200) });
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">Works</h1>
      <form>
        <label>
          Search title or first author{" "}
          <input name="q" defaultValue={q} className="rounded border border-rule bg-paper px-2" />
        </label>{" "}
        <button className="rounded border border-ink px-2">Search</button>
      </form>
      {works.length === 0 ? (
        <EmptyState title="No works yet" action={{ href: "/dashboards", label: "Open the dashboards" }}>
          Works appear once mined articles&apos; references are resolved.
        </EmptyState>
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr>
              <th scope="col" className="text-left">
                Work
              </th>
              <th scope="col">Year</th>
              <th scope="col">Type</th>
              <th scope="col">In corpus</th>
              <th scope="col">References</th>
            </tr>
          </thead>
          <tbody>
            {works.map((w) => (
              <tr key={w.id} className="border-t border-rule">
                <td>
                  <Link className="underline" href={`/works/${w.id}`}>
                    {w.title ?? w.first_author ?? "Untitled work"}
                  </Link>
                </td>
                <td>{w.year ?? "n.d."}</td>
                <td>{w.work_type.replace("_", " ")}</td>
                <td>{w.in_corpus ? "yes" : "no"}</td>
                <td>{w.references}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
