import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/session";
import { AppShell } from "@/components/shell/app-shell";
import { DatabaseDown } from "@/components/shell/database-down";
import { isDatabaseDown } from "@/lib/server/errors";

// Everything inside (app) is for signed-in people; each page still checks its own permission.
export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  let actor;
  try {
    actor = await getActor();
  } catch (err) {
    if (isDatabaseDown(err)) return <DatabaseDown />;
    throw err;
  }
  if (!actor) redirect("/sign-in");
  return <AppShell actor={actor}>{children}</AppShell>;
}
