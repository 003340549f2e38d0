/**
 * The one helper every route handler goes through: authenticate, check the permission, parse the
 * route params, body and query with zod (keeping the schemas' types), and turn every failure into
 * the one error shape. Nothing from a stack trace reaches the browser.
 *
 * Params that do not parse (a malformed id, an unknown dashboard name) answer 404, never 400: an
 * address that cannot name anything names nothing, the same answer as a well-formed id of a row
 * that does not exist.
 */
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { getActor } from "./session";
import { can, type Actor, type Permission } from "@/lib/auth/permissions";
import { DomainError, NotFoundError } from "@/lib/errors";
import { HttpError, errorBody, isDatabaseDown, unauthenticated, forbidden } from "./errors";

export const DEFAULT_BODY_LIMIT = 256 * 1024;

type Ctx<B, Q, P> = {
  actor: Actor;
  body: B;
  query: Q;
  params: P;
  req: NextRequest;
};

type Options<B extends z.ZodType | undefined, Q extends z.ZodType | undefined, P extends z.ZodType | undefined> = {
  permission: Permission;
  body?: B;
  query?: Q;
  /** The dynamic segments of the path, e.g. `z.object({ id: z.uuid() })`; a mismatch answers 404. */
  params?: P;
  /** What the 404 for params that do not parse calls the thing ("That article"). */
  notFound?: string;
  maxBytes?: number;
};

type Infer<S> = S extends z.ZodType ? z.infer<S> : undefined;

/** The params schema most handlers with one id need. */
export const idParams = z.object({ id: z.uuid() });

export function route<
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(opts: Options<B, Q, P>, fn: (ctx: Ctx<Infer<B>, Infer<Q>, Infer<P>>) => Promise<Response | unknown>) {
  return async (req: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => {
    try {
      const actor = await getActor();
      if (!actor) throw unauthenticated();
      if (!can(actor, opts.permission)) throw forbidden();
      const params = opts.params ? parseParams(opts.params, (await context?.params) ?? {}, opts.notFound) : undefined;
      const query = opts.query ? parse(opts.query, Object.fromEntries(req.nextUrl.searchParams)) : undefined;
      const body = opts.body ? parse(opts.body, await readJson(req, opts.maxBytes ?? DEFAULT_BODY_LIMIT)) : undefined;
      const out = await fn({
        actor,
        body: body as Infer<B>,
        query: query as Infer<Q>,
        params: params as Infer<P>,
        req,
      });
      if (out instanceof Response) return out;
      return NextResponse.json(out ?? { ok: true });
    } catch (err) {
      return errorResponse(err);
    }
  };
}

/** The status each kind of domain error (lib/errors.ts) answers with. */
const DOMAIN_STATUS: Record<DomainError["kind"], number> = {
  invalid: 400,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
};

export function errorResponse(err: unknown): Response {
  if (err instanceof HttpError) {
    return NextResponse.json(errorBody(err.code, err.message, err.field), { status: err.status });
  }
  if (err instanceof DomainError) {
    return NextResponse.json(errorBody(err.code ?? err.kind, err.message, err.field), {
      status: DOMAIN_STATUS[err.kind],
    });
  }
  // next/navigation's redirect/forbidden throw control-flow errors that Next must see.
  if (
    err &&
    typeof err === "object" &&
    "digest" in err &&
    String((err as { digest: unknown }).digest).startsWith("NEXT_")
  )
    throw err;
  if (isDatabaseDown(err)) {
    return NextResponse.json(
      errorBody("database_unavailable", "The database is not reachable right now. Try again in a minute."),
      { status: 503 },
    );
  }
  console.error("[route] unexpected error:", err);
  return NextResponse.json(errorBody("internal", "Something went wrong on our side. The error was logged."), {
    status: 500,
  });
}

function parseParams<S extends z.ZodType>(schema: S, input: unknown, what?: string): z.infer<S> {
  const r = schema.safeParse(input);
  if (!r.success) throw new NotFoundError(what);
  return r.data;
}

function parse<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const r = schema.safeParse(input);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const field = issue?.path.join(".") || undefined;
  throw new HttpError(
    400,
    "invalid",
    field ? `${field}: ${issue.message}` : (issue?.message ?? "Invalid input."),
    field,
  );
}

/** Reads a JSON body with a byte limit that holds even when Content-Length lies or is absent. */
export async function readJson(req: Request, maxBytes: number): Promise<unknown> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes)
    throw new HttpError(413, "too_large", `The request body is larger than ${maxBytes} bytes.`, "body");
  const buf = await readLimited(req, maxBytes);
  if (buf.length === 0) throw new HttpError(400, "invalid", "The request needs a JSON body.", "body");
  try {
    return JSON.parse(new TextDecoder().decode(buf));
  } catch {
    throw new HttpError(400, "invalid", "The request body is not valid JSON.", "body");
  }
}

export async function readLimited(req: Request, maxBytes: number): Promise<Uint8Array> {
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > maxBytes) {
      await reader.cancel();
      throw new HttpError(413, "too_large", `The request body is larger than ${maxBytes} bytes.`, "body");
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let off = 0;
  for (const c of chunks) {
    out.set(c, off);
    off += c.length;
  }
  return out;
}

/** For the few handlers anonymous visitors may call (accepting an invitation). */
export function publicRoute<B extends z.ZodType>(
  opts: { body: B; maxBytes?: number },
  fn: (ctx: { body: z.infer<B>; req: NextRequest }) => Promise<Response | unknown>,
) {
  return async (req: NextRequest) => {
    try {
      const body = parse(opts.body, await readJson(req, opts.maxBytes ?? DEFAULT_BODY_LIMIT));
      const out = await fn({ body, req });
      return out instanceof Response ? out : NextResponse.json(out ?? { ok: true });
    } catch (err) {
      return errorResponse(err);
    }
  };
}
