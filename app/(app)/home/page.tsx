import Link from "next/link";
import { requirePage } from "@/lib/server/session";
import { can } from "@/lib/auth/permissions";
import { getDb } from "@/db";
import { corpusCounts } from "@/db/queries/articles";
import { listVenues } from "@/db/queries/venues";
import { plural } from "@/lib/vocabulary";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata = { title: "Home" };

export default async function HomePage() {
  const actor = await requirePage("corpus:read");
  const db = getDb();
  const [counts, venues] = await Promise.all([corpusCounts(db), listVenues(db, { ids: actor.venueIds })]);

  return (
    <div className="grid gap-8">
      <header>
        <h1 className="font-serif text-3xl font-semibold">Welcome{actor.name ? `, ${actor.name}` : ""}</h1>
        <p className="mt-1 text-ink-2">What Echoline holds now, and what you can do next.</p>
      </header>
      <dl className="grid grid-cols-2 gap-4 sm:grid-cols-4" aria-label="Corpus at a glance">
        {[
          ["Articles", counts.articles],
          ["Mined", counts.done],
          ["Waiting or mining", counts.pending],
          ["Statements", counts.statements],
        ].map(([label, n]) => (
          <div key={String(label)} className="rounded-lg border border-rule bg-paper-2 p-4">
            <dt className="text-sm text-ink-2">{label}</dt>
            <dd className="text-2xl font-semibold tabular-nums">{Number(n).toLocaleString("en")}</dd>
          </div>
        ))}
      </dl>
      {Number(counts.articles) === 0 ? (
        can(actor, "corpus:upload") ? (
          <EmptyState title="The corpus is empty" action={{ href: "/upload", label: "Upload articles" }}>
            Upload open-access PDFs or JATS XML (with a BibTeX, RIS or CSV metadata file if you have one). Mining starts
            at once.
          </EmptyState>
        ) : (
          <EmptyState title="The corpus is empty">
            No articles have been loaded yet. A curator uploads them; once they are mined, dashboards fill in here.
          </EmptyState>
        )
      ) : (
        <section aria-labelledby="next-h" className="grid gap-3">
          <h2 id="next-h" className="font-semibold text-lg">
            Next steps
          </h2>
          <ul className="grid gap-2 sm:grid-cols-2">
            <li>
              <Link className="underline" href="/dashboards">
                See how practices spread over time
              </Link>
            </li>
            <li>
              <Link className="underline" href="/articles">
                Browse the mined articles
              </Link>
            </li>
            {can(actor, "corpus:upload") && (
              <li>
                <Link className="underline" href="/upload">
                  Upload more articles
                </Link>
              </li>
            )}
            {Number(counts.failed) > 0 && can(actor, "corpus:curate") && (
              <li>
                <Link className="underline" href="/articles?status=failed">
                  {plural(Number(counts.failed), "article")} failed to mine: see why
                </Link>
              </li>
            )}
            {can(actor, "admin:users") && (
              <li>
                <Link className="underline" href="/admin/people">
                  Invite people
                </Link>
              </li>
            )}
          </ul>
        </section>
      )}
      {actor.role === "editor" && (
        <section aria-labelledby="venues-h">
          <h2 id="venues-h" className="font-semibold text-lg">
            Your venues
          </h2>
          {venues.length ? (
            <ul className="mt-2 list-disc pl-5">
              {venues.map((v) => (
                <li key={v.id}>{v.name}</li>
              ))}
            </ul>
          ) : (
            <p className="mt-2 text-ink-2">
              You are not linked to a venue yet. Ask an admin to link you to your journal.
            </p>
          )}
        </section>
      )}
    </div>
  );
}
