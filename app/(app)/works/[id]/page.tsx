import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { workDetail } from "@/lib/graph/work-detail";
import { practiceOptions } from "@/db/queries/practices";
import { formatValue, labelOf, plural } from "@/lib/vocabulary";
import { CurateWork, SourceCheckForm } from "@/components/works/work-forms";
import { CitingArticlesTable } from "@/components/works/citing-articles-table";

export const metadata = { title: "Work" };

export default async function WorkPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePage("corpus:read");
  const { id } = await params;
  if (!z.uuid().safeParse(id).success) notFound();
  const db = getDb();
  const d = await workDetail(db, id);
  if (!d) notFound();
  const curator = can(actor, "corpus:curate");
  const practices = curator ? await practiceOptions(db) : [];
  const articles = new Set(d.references.map((r) => r.article_id)).size;
  return (
    <div className="grid gap-6">
      <header className="grid gap-1">
        <p className="text-sm text-ink-2">
          <Link href="/works" className="underline">
            Works
          </Link>
        </p>
        <h1 className="font-serif text-3xl font-semibold">{d.work.title ?? d.work.first_author ?? "Untitled work"}</h1>
        <p className="text-ink-2">
          {d.work.year ?? "n.d."} · {labelOf("workType", d.work.work_type)},{" "}
          {labelOf("workTypeDecider", d.work.type_decided_by)}
          {d.work.doi && <> · DOI {d.work.doi}</>}
        </p>
        {d.article && (
          <p>
            In the corpus:{" "}
            <Link className="underline" href={`/articles/${d.article.id}`}>
              {d.article.title}
            </Link>
          </p>
        )}
      </header>
      <section className="grid gap-2" aria-labelledby="says-h">
        <h2 id="says-h" className="text-lg font-medium">
          What it says, per practice
        </h2>
        {d.checks.length === 0 ? (
          <p className="text-ink-2">No source checks yet.{curator ? " Record one below." : ""}</p>
        ) : (
          <ul className="grid gap-1">
            {d.checks.map((c) => (
              <li key={c.id}>
                {c.practice_label}: <strong className="font-medium">{labelOf("sourceCheckVerdict", c.verdict)}</strong>
                {c.page ? `, p. ${c.page}` : ""}
                {c.stated_value !== null ? `, states ${formatValue(Number(c.stated_value))}` : ""}
                {c.quote && <q className="evidence ml-1">{c.quote}</q>}
              </li>
            ))}
          </ul>
        )}
      </section>
      {curator && <SourceCheckForm workId={d.work.id} practices={practices} />}
      <section className="grid gap-2" aria-labelledby="cited-h">
        <h2 id="cited-h" className="text-lg font-medium">
          Cited by {plural(articles, "article")} ({plural(d.references.length, "reference")})
        </h2>
        {d.references.length === 0 ? (
          <p className="text-ink-2">No reference in the corpus resolves to this work any more.</p>
        ) : (
          <CitingArticlesTable rows={d.references} />
        )}
      </section>
      {curator && (
        <CurateWork
          workId={d.work.id}
          workType={d.work.work_type}
          references={d.references.map((r) => ({ id: r.id, raw: r.raw }))}
        />
      )}
    </div>
  );
}
