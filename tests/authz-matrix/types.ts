import type { Role } from "@/db/schema/accounts";

/**
 * One row per page or route-handler method. `file` is the path under app/ so the matrix test can
 * tell when a file on disk has no row. `path` is a concrete URL (dynamic segments filled with a
 * sample id). `allow` lists the roles that must get through; every other role must get 403 and an
 * anonymous visitor 401 (route handlers) or a redirect to /sign-in (pages). "public" rows must be
 * reachable by everyone.
 */
export type MatrixRow = {
  file: string;
  path: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE" | "PAGE";
  allow: Role[] | "public";
  /** JSON body to send for write methods (may be invalid: the check is only "not 401/403"). */
  body?: unknown;
};

export const ANY_SIGNED_IN: Role[] = ["admin", "curator", "editor", "instructor", "reader"];
export const SAMPLE_ID = "00000000-0000-4000-8000-000000000000";
