import Link from "next/link";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { practicesWithCounts } from "@/db/queries/practices";
import { PracticeForm } from "@/components/practices/practice-form";
import { EmptyState } from "@/components/ui/empty-state";

export default async function PracticesPage() {
  const actor = await requirePage("corpus:read");
  const rows = await practicesWithCounts(getDb());
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">Practices</h1>
      <p className="text-sm text-ink-2">
        A practice is a cut-off as authors assert it. Tracking one reports how it is used and sourced; it does not
        endorse it.
      </p>
      {can(actor, "practices:manage") && (
        <>
          <PracticeForm />
          <p className="text-sm">
            Misdescribed procedures the miner looks for are kept in{" "}
            <Link className="underline" href="/practices/procedures">
              the procedure list
            </Link>
            .
          </p>
        </>
      )}
      {rows.length === 0 ? (
        <EmptyState title="No practices yet">A curator defines the first practice above.</EmptyState>
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr>
              <th scope="col" className="text-left">
                Practice
              </th>
              <th scope="col" className="text-right pr-6">
                Statements
              </th>
              <th scope="col" className="text-left">
                Seeded
              </th>
              <th scope="col" className="text-left">
                Open
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((p) => (
              <tr key={p.id} className="border-t border-rule">
                <td className="py-1">{p.label}</td>
                <td className="text-right pr-6">{p.statements}</td>
                <td>{p.is_seeded ? "yes" : "no"}</td>
                <td>
                  <Link className="underline" href={`/dashboards/practice-over-time?practice=${p.id}`}>
                    dashboards
                  </Link>{" "}
                  ·{" "}
                  <Link className="underline" href={`/trails?practice=${p.id}`}>
                    trails
                  </Link>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
