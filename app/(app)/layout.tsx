import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/session";
import { AppShell } from "@/components/shell/app-shell";

// Everything inside (app) is for signed-in people; each page still checks its own permission.
export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  return <AppShell actor={actor}>{children}</AppShell>;
}
