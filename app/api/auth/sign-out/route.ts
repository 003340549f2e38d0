import { NextResponse } from "next/server";
import { signOut } from "@/lib/server/auth";
import { appUrl } from "@/lib/env";

// A plain form POST from the shell. The session cookie is sameSite=lax, so another site cannot
// make a signed-in browser send it with a cross-site POST.
export async function POST() {
  await signOut({ redirect: false });
  return NextResponse.redirect(`${appUrl()}/`, 303);
}
