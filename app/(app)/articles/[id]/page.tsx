import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { getArticle } from "@/lib/corpus/articles";
import { listVenues } from "@/db/queries/venues";
import { listProcedures } from "@/lib/corpus/procedures-store";
import { LABELS, plural, type Section } from "@/lib/vocabulary";
import { EmptyState } from "@/components/ui/empty-state";
import { Evidence } from "@/components/articles/highlight";
import { LiveStatus } from "@/components/articles/live-status";
import { MetadataForm } from "@/components/articles/metadata-form";
import { RemineButton, ReviewButtons } from "@/components/articles/statement-actions";
import { StatementFacts } from "@/components/articles/statement-facts";

export const metadata = { title: "Article" };

const SECTION_ORDER: Section[] = ["introduction", "methods", "results", "discussion", "other", "unknown"];
// Headings of the groups (the vocabulary's section names, with "no heading" spelled out).
const SECTION_LABEL: Record<Section, string> = { ...LABELS.section, unknown: "No section heading found" };

export default async function ArticlePage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePage("corpus:read");
  const { id } = await params;
  if (!z.string().uuid().safeParse(id).success) notFound();
  const db = getDb();
  const detail = await getArticle(db, id);
  if (!detail) notFound();
  const { article: a, statements, counts } = detail;
  const curate = can(actor, "corpus:curate");
  const venues = curate ? await listVenues(db) : [];
  const procedureLabels = statements.some((x) => x.procedure_key)
    ? new Map((await listProcedures(db)).map((p) => [p.key, p.label]))
    : new Map<string, string>();
  const bySection = SECTION_ORDER.map((s) => ({ section: s, items: statements.filter((x) => x.section === s) })).filter(
    (g) => g.items.length,
  );

  return (
    <div className="grid gap-8">
      <header className="grid gap-2">
        <p className="text-sm text-ink-2">
          <Link href="/articles" className="underline">
            Articles
          </Link>{" "}
          / {a.original_filename}
          {a.is_demo && " · invented demo article"}
        </p>
        <h1 className="font-serif text-3xl font-semibold">{a.title ?? a.original_filename}</h1>
        <p className="text-ink-2">
          {a.authors.length ? a.authors.join("; ") : "Authors unknown"} · {a.venue ?? "venue unknown"} ·{" "}
          {a.year ?? "year unknown"}
          {a.doi && <> · DOI {a.doi}</>} ·{" "}
          {a.licence ? (
            `Licence: ${a.licence}`
          ) : (
            <span className="text-accent">
              Licence not recorded: this article stays out of the dashboards until it is.
            </span>
          )}
        </p>
        <div className="flex flex-wrap items-center gap-4">
          <LiveStatus articleId={a.id} initial={a.status} reason={a.failure_message} />
          {a.status === "done" && (
            <span className="text-sm text-ink-2 tabular-nums">
              {plural(a.pages ?? 0, "page")} · {plural(statements.length, "statement")} ·{" "}
              {plural(counts.citations, "in-text citation")} · {plural(counts.references, "reference")}
            </span>
          )}
          {curate && <RemineButton articleId={a.id} />}
        </div>
      </header>

      <section className="grid gap-4" aria-labelledby="statements-h">
        <h2 id="statements-h" className="text-xl font-semibold">
          Statements
        </h2>
        <p className="text-sm text-ink-2">
          Flags are screening aids, not findings: read the article before acting on one.
        </p>
        {statements.length === 0 ? (
          <EmptyState
            title={
              a.status === "done"
                ? "No statements in this article"
                : a.status === "failed"
                  ? "Mining failed"
                  : "Not mined yet"
            }
          >
            {a.status === "done"
              ? "The miner found no cut-off claims, reported values or listed procedures. If you expected some, check the text layer and re-mine after the extractor improves."
              : a.status === "failed"
                ? `${a.failure_message ?? "No reason recorded."} Fix the file and upload it again, or re-mine.`
                : "This page updates by itself when mining ends."}
          </EmptyState>
        ) : (
          bySection.map((g) => (
            <div key={g.section} className="grid gap-3">
              <h3 className="font-semibold">{SECTION_LABEL[g.section]}</h3>
              <ul className="grid gap-4">
                {g.items.map((s) => (
                  <li
                    key={s.id}
                    id={`statement-${s.id}`}
                    className={`grid gap-1 border-l-2 pl-3 scroll-mt-4 target:border-accent target:bg-paper-2 ${s.framing === "disputed" ? "border-dashed border-ink-2" : "border-rule"}`}
                    data-testid="statement"
                  >
                    <Evidence sentence={s.sentence} value={s.value} citations={s.citations} />
                    <div className="flex flex-wrap items-center gap-3 text-sm text-ink-2">
                      <StatementFacts
                        s={s}
                        procedureLabel={s.procedure_key ? procedureLabels.get(s.procedure_key) : undefined}
                      />
                      {curate && (
                        <ReviewButtons
                          articleId={a.id}
                          statementId={s.id}
                          mine={s.reviews.find((r) => r.reviewer_id === actor.id)?.verdict ?? null}
                        />
                      )}
                    </div>
                  </li>
                ))}
              </ul>
            </div>
          ))
        )}
      </section>

      {curate && (
        <section className="grid gap-3" aria-labelledby="meta-h">
          <h2 id="meta-h" className="text-xl font-semibold">
            Correct the metadata
          </h2>
          <MetadataForm
            articleId={a.id}
            venues={venues}
            initial={{
              title: a.title,
              authors: a.authors,
              venueId: a.venue_id,
              year: a.year,
              doi: a.doi,
              licence: a.licence,
            }}
          />
        </section>
      )}
    </div>
  );
}
