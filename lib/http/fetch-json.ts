/** Browser-side fetch for react-query: throws an Error carrying the server's {error:{code,message,field}}. */
export class ApiError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public field?: string,
  ) {
    super(message);
  }
}

export async function fetchJson<T>(input: string, init?: RequestInit & { json?: unknown }): Promise<T> {
  const { json, ...rest } = init ?? {};
  const res = await fetch(input, {
    ...rest,
    headers: { ...(json !== undefined ? { "content-type": "application/json" } : {}), ...(rest.headers ?? {}) },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  const text = await res.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    throw new ApiError(res.status, "bad_response", `The server answered ${res.status} without JSON.`);
  }
  if (!res.ok) {
    const e = (data as { error?: { code: string; message: string; field?: string } })?.error;
    throw new ApiError(res.status, e?.code ?? "error", e?.message ?? `Request failed (${res.status}).`, e?.field);
  }
  return data as T;
}

/**
 * A failed request as form errors: on the field the server named (its top-level name, so `authors.2`
 * lands on the authors box), else on the whole form. Every form maps server errors through this.
 */
export function formErrorsOf(e: Error): Record<string, string> {
  return e instanceof ApiError && e.field ? { [e.field.split(".")[0]]: e.message } : { form: e.message };
}
