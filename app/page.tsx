import Link from "next/link";
import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/session";

export default async function LandingPage() {
  if (await getActor()) redirect("/home");
  return (
    <main id="main" className="mx-auto w-full max-w-3xl px-4 py-16">
      <p className="text-sm uppercase tracking-widest text-ink-2">Echoline</p>
      <h1 className="mt-2 font-serif text-4xl font-semibold leading-tight">
        Where do the cut-offs in methods sections come from?
      </h1>
      <p className="mt-6 font-serif text-lg leading-relaxed">
        Echoline is for meta-researchers, journal editors and methods instructors who study how research methods are
        used across a discipline. Curators load open-access articles; Echoline mines each methods section for the
        cut-off values it asserts (&ldquo;reliability above .70 is acceptable&rdquo;), the values it reports, the
        procedures it describes and the citations behind them &mdash; with or without a page, second-hand or missing
        &mdash; and follows those citations back through the literature, so you can see which claims trace to a methods
        source that says so, which rest on earlier empirical articles, and which rest on nothing, year by year and venue
        by venue.
      </p>
      <p className="mt-8">
        <Link href="/sign-in" className="rounded bg-ink px-4 py-2 text-paper hover:opacity-90">
          Sign in
        </Link>
      </p>
    </main>
  );
}
