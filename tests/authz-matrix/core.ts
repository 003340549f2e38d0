import { ANY_SIGNED_IN, SAMPLE_ID, type MatrixRow } from "./types";

// Pages and handlers of the foundation: landing, sign-in, invitations, home, admin.
export const coreRows: MatrixRow[] = [
  { file: "app/page.tsx", path: "/", method: "PAGE", allow: "public" },
  { file: "app/sign-in/page.tsx", path: "/sign-in", method: "PAGE", allow: "public" },
  { file: "app/sign-in/check-email/page.tsx", path: "/sign-in/check-email", method: "PAGE", allow: "public" },
  { file: "app/sign-in/link/page.tsx", path: "/sign-in/link?token=x&email=y%40z.org", method: "PAGE", allow: "public" },
  { file: "app/sign-in/problem/page.tsx", path: "/sign-in/problem?error=Verification", method: "PAGE", allow: "public" },
  { file: "app/invite/[token]/page.tsx", path: "/invite/not-a-real-invitation-token-000", method: "PAGE", allow: "public" },
  { file: "app/api/auth/[...nextauth]/route.ts", path: "/api/auth/providers", method: "GET", allow: "public" },
  { file: "app/api/auth/[...nextauth]/route.ts", path: "/api/auth/callback/credentials", method: "POST", allow: "public", body: {} },
  { file: "app/api/auth/sign-out/route.ts", path: "/api/auth/sign-out", method: "POST", allow: "public" },
  { file: "app/api/invitations/accept/route.ts", path: "/api/invitations/accept", method: "POST", allow: "public", body: {} },
  { file: "app/(app)/home/page.tsx", path: "/home", method: "PAGE", allow: ANY_SIGNED_IN },
  { file: "app/(app)/admin/people/page.tsx", path: "/admin/people", method: "PAGE", allow: ["admin"] },
  { file: "app/(app)/admin/venues/page.tsx", path: "/admin/venues", method: "PAGE", allow: ["admin"] },
  { file: "app/(app)/admin/mail/page.tsx", path: "/admin/mail", method: "PAGE", allow: ["admin"] },
  { file: "app/api/admin/users/route.ts", path: "/api/admin/users", method: "GET", allow: ["admin"] },
  { file: "app/api/admin/users/[id]/route.ts", path: `/api/admin/users/${SAMPLE_ID}`, method: "PATCH", allow: ["admin"], body: {} },
  { file: "app/api/admin/invitations/route.ts", path: "/api/admin/invitations", method: "POST", allow: ["admin"], body: {} },
  { file: "app/api/admin/venues/route.ts", path: "/api/admin/venues", method: "GET", allow: ["admin"] },
  { file: "app/api/admin/venues/route.ts", path: "/api/admin/venues", method: "POST", allow: ["admin"], body: {} },
  { file: "app/api/admin/venues/[id]/route.ts", path: `/api/admin/venues/${SAMPLE_ID}`, method: "PATCH", allow: ["admin"], body: {} },
  { file: "app/api/venues/route.ts", path: "/api/venues", method: "GET", allow: ANY_SIGNED_IN },
];
