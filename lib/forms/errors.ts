import type { z } from "zod";

/**
 * A zod error as one message per form field (the first issue of each), keyed by the top-level field
 * name, so `authors.3` shows under the authors box. Issues without a path go to `form`.
 */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? String(issue.path[0]) : "form";
    out[key] ??= issue.message;
  }
  return out;
}
