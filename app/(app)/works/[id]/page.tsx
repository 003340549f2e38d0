import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { workDetail } from "@/lib/graph/work-detail";
import { practiceOptions } from "@/db/queries/practices";
import { CurateWork, SourceCheckForm } from "@/components/works/work-forms";

const VERDICT: Record<string, string> = {
  says_so: "says so",
  says_otherwise: "says otherwise",
  silent: "is silent",
  not_checked: "not checked",
};

export default async function WorkPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePage("corpus:read");
  const { id } = await params;
  if (!z.uuid().safeParse(id).success) notFound();
  const db = getDb();
  const d = await workDetail(db, id);
  if (!d) notFound();
  const curator = can(actor, "corpus:curate");
  const practices = curator ? await practiceOptions(db) : [];
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">{d.work.title ?? d.work.first_author ?? "Untitled work"}</h1>
      <p className="text-ink-2">
        {d.work.year ?? "n.d."} · {d.work.work_type.replace("_", " ")} (decided by {d.work.type_decided_by}){" "}
        {d.work.doi && <>· DOI {d.work.doi}</>}
      </p>
      {d.article && (
        <p>
          In the corpus:{" "}
          <Link className="underline" href={`/articles/${d.article.id}`}>
            {d.article.title}
          </Link>
        </p>
      )}
      <section>
        <h2 className="text-lg font-medium">What it says, per practice</h2>
        {d.checks.length === 0 ? (
          <p className="text-ink-2">No source checks yet.{curator ? " Record one below." : ""}</p>
        ) : (
          <ul>
            {d.checks.map((c) => (
              <li key={c.id}>
                {c.practice_label}: {VERDICT[c.verdict]}
                {c.page ? `, p. ${c.page}` : ""}
                {c.stated_value !== null ? `, states ${c.stated_value}` : ""}
                {c.quote && <q className="evidence ml-1">{c.quote}</q>}
              </li>
            ))}
          </ul>
        )}
      </section>
      {curator && <SourceCheckForm workId={d.work.id} practices={practices} />}
      <section>
        <h2 className="text-lg font-medium">Cited by ({d.references.length} references)</h2>
        <ul className="text-sm">
          {d.references.map((r) => (
            <li key={r.id}>
              <Link className="underline" href={`/articles/${r.article_id}`}>
                {r.article_title ?? "Untitled"}
              </Link>{" "}
              ({r.year ?? "n.d."}): {r.citations} in-text citations, {r.with_locator} with a page
              {r.work_set_by === "curator" && " · placed here by a curator"}
            </li>
          ))}
        </ul>
      </section>
      {curator && <CurateWork workId={d.work.id} references={d.references.map((r) => ({ id: r.id, raw: r.raw }))} />}
    </div>
  );
}
