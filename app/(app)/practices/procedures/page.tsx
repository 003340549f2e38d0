import { requirePage } from "@/lib/server/session";
import { getDb } from "@/db";
import { listProcedures } from "@/lib/corpus/procedures-store";
import { EmptyState } from "@/components/ui/empty-state";
import { ProcedureEditor } from "@/components/articles/procedure-editor";

export const metadata = { title: "Misdescribed procedures" };

export default async function ProceduresPage() {
  await requirePage("practices:manage");
  const procedures = await listProcedures(getDb());
  return (
    <div className="grid gap-6">
      <h1 className="font-serif text-3xl font-semibold">Misdescribed procedures</h1>
      <p className="max-w-prose text-ink-2">
        The miner flags a sentence as a procedure statement when it matches one of the enabled entries below. Patterns
        are regular expressions, matched without regard to case. Re-mine articles to apply a change to them.
      </p>
      {procedures.length === 0 && (
        <EmptyState title="No procedures yet">
          Add the first one with the form at the bottom, or run the database seed to load the defaults.
        </EmptyState>
      )}
      {procedures.map((p) => (
        <ProcedureEditor key={p.id} proc={p} />
      ))}
      <h2 className="text-xl font-semibold">Add a procedure</h2>
      <ProcedureEditor proc={null} />
    </div>
  );
}
