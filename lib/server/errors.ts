import { NotFoundError } from "@/lib/errors";

/**
 * The one error shape every route handler returns: `{ error: { code, message, field? } }`.
 * HttpError is for what only the web layer knows (401, 413, 415, a refused body); lib/ throws the
 * domain errors of lib/errors.ts instead, which `errorResponse` maps to the same shape.
 */
export class HttpError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public field?: string,
  ) {
    super(message);
  }
}

export const unauthenticated = () => new HttpError(401, "unauthenticated", "Sign in to continue.");
export const forbidden = () => new HttpError(403, "forbidden", "Your role does not allow this.");
export const notFound = (what = "That item") => new NotFoundError(what);

export function errorBody(code: string, message: string, field?: string) {
  return { error: field ? { code, message, field } : { code, message } };
}

/** PostgreSQL unreachable (refused, timed out, shutting down): the caller shows a clear page, not a stack. */
export function isDatabaseDown(err: unknown): boolean {
  const e = err as { code?: string; message?: string } | null;
  if (!e) return false;
  return (
    ["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P03", "08006", "08001", "08003"].includes(e.code ?? "") ||
    /timeout exceeded when trying to connect|Connection terminated/i.test(e.message ?? "")
  );
}

/** Unique violations are recognised by PostgreSQL's error code, never by message text. */
export function isUniqueViolation(err: unknown): boolean {
  return (err as { code?: string } | null)?.code === "23505";
}
