import { notFound } from "next/navigation";
import Link from "next/link";
import { z } from "zod";
import { requirePage } from "@/lib/server/session";
import { StatementTrail } from "@/components/trails/statement-trail";

export default async function StatementTrailPage({
  params,
  searchParams,
}: {
  params: Promise<{ statementId: string }>;
  searchParams: Promise<{ practice?: string }>;
}) {
  await requirePage("corpus:read");
  const { statementId } = await params;
  if (!z.uuid().safeParse(statementId).success) notFound();
  const { practice } = await searchParams;
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">Trail of one statement</h1>
      <Link href={`/trails${practice ? `?practice=${practice}` : ""}`} className="underline">
        Back to the practice&apos;s trail graph
      </Link>
      <StatementTrail
        statementId={statementId}
        practiceId={z.uuid().safeParse(practice).success ? practice : undefined}
      />
    </div>
  );
}
