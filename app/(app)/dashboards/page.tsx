import { redirect } from "next/navigation";
import { requirePage } from "@/lib/server/session";

export default async function DashboardsIndex({ searchParams }: { searchParams: Promise<Record<string, string>> }) {
  await requirePage("corpus:read");
  const sp = new URLSearchParams(await searchParams).toString();
  redirect(`/dashboards/practice-over-time${sp ? `?${sp}` : ""}`);
}
