"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sourceCheckSchema } from "@/lib/graph/practice-form";

type Practice = { id: string; label: string };
type FieldErrors = Partial<Record<string, string>>;

async function post(
  url: string,
  method: string,
  body: unknown,
): Promise<{ ok: true } | { ok: false; field?: string; message: string }> {
  const r = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  if (r.ok) return { ok: true };
  const e = await r.json().catch(() => null);
  return { ok: false, field: e?.error?.field, message: e?.error?.message ?? "That did not work. Try again." };
}

/** A curator records what the work says for a practice (one zod schema shared with the route). */
export function SourceCheckForm({ workId, practices }: { workId: string; practices: Practice[] }) {
  const router = useRouter();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [status, setStatus] = useState("");
  return (
    <form
      className="space-y-2 rounded border border-rule p-3"
      aria-label="Record a source check"
      onSubmit={async (e) => {
        e.preventDefault();
        const fd = Object.fromEntries(new FormData(e.currentTarget));
        const input = {
          workId,
          practiceId: fd.practiceId,
          verdict: fd.verdict,
          page: fd.page || null,
          quote: fd.quote || null,
          statedValue: fd.statedValue === "" ? null : fd.statedValue,
        };
        const parsed = sourceCheckSchema.safeParse(input);
        if (!parsed.success) {
          setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
          return;
        }
        setErrors({});
        const r = await post("/api/source-checks", "POST", parsed.data);
        if (!r.ok) setErrors({ [r.field ?? "form"]: r.message });
        else {
          setStatus("Saved. Trails of this practice are being rebuilt.");
          router.refresh();
        }
      }}
    >
      <h3 className="font-medium">Record what this work says</h3>
      <label className="block">
        Practice{" "}
        <select
          name="practiceId"
          className="ml-2 rounded border border-rule bg-paper"
          aria-describedby="err-practiceId"
        >
          {practices.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      <fieldset>
        <legend>It…</legend>
        {[
          ["says_so", "says so"],
          ["says_otherwise", "says otherwise"],
          ["silent", "is silent"],
          ["not_checked", "not checked yet"],
        ].map(([v, l]) => (
          <label key={v} className="mr-3">
            <input type="radio" name="verdict" value={v} defaultChecked={v === "says_so"} /> {l}
          </label>
        ))}
      </fieldset>
      <label className="block">
        Page <input name="page" className="ml-2 w-24 rounded border border-rule bg-paper" aria-describedby="err-page" />
      </label>
      <label className="block">
        Stated value{" "}
        <input
          name="statedValue"
          inputMode="decimal"
          className="ml-2 w-24 rounded border border-rule bg-paper"
          aria-describedby="err-statedValue"
        />
      </label>
      <label className="block">
        Short quote{" "}
        <textarea
          name="quote"
          maxLength={600}
          className="block w-full rounded border border-rule bg-paper"
          aria-describedby="err-quote"
        />
      </label>
      <div aria-live="polite" className="text-sm">
        {Object.entries(errors).map(([k, m]) => (
          <p key={k} id={`err-${k}`} className="text-accent">
            {m}
          </p>
        ))}
        {status && <p>{status}</p>}
      </div>
      <button className="rounded bg-ink px-3 py-1.5 text-paper">Save source check</button>
    </form>
  );
}

export function CurateWork({ workId, references }: { workId: string; references: { id: string; raw: string }[] }) {
  const router = useRouter();
  const [msg, setMsg] = useState("");
  return (
    <div className="space-y-3 rounded border border-rule p-3">
      <h3 className="font-medium">Curate this work</h3>
      <form
        onSubmit={async (e) => {
          e.preventDefault();
          const t = new FormData(e.currentTarget).get("workType");
          const r = await post(`/api/works/${workId}`, "PATCH", { workType: t });
          setMsg(r.ok ? "Type saved; trails are being rebuilt." : r.message);
          router.refresh();
        }}
      >
        <label>
          Type{" "}
          <select name="workType" className="rounded border border-rule bg-paper">
            <option value="methods_source">methods source</option>
            <option value="empirical">empirical</option>
            <option value="unknown">unknown</option>
          </select>
        </label>{" "}
        <button className="rounded border border-ink px-2 py-0.5">Set type</button>
      </form>
      <form
        onSubmit={async (e) => {
          e.preventDefault();
          const into = String(new FormData(e.currentTarget).get("intoId") ?? "").trim();
          const r = await post(`/api/works/${workId}/merge`, "POST", { intoId: into });
          if (r.ok) router.push(`/works/${into}`);
          else setMsg(r.message);
        }}
      >
        <label>
          Merge into work id <input name="intoId" className="w-80 rounded border border-rule bg-paper" />
        </label>{" "}
        <button className="rounded border border-ink px-2 py-0.5">Merge</button>
      </form>
      <form
        onSubmit={async (e) => {
          e.preventDefault();
          const ids = new FormData(e.currentTarget).getAll("ref").map(String);
          const r = await post(`/api/works/${workId}/split`, "POST", { referenceIds: ids });
          setMsg(r.ok ? "Split off into a new work." : r.message);
          router.refresh();
        }}
      >
        <fieldset>
          <legend>Split wrongly matched references off</legend>
          {references.map((r) => (
            <label key={r.id} className="block text-sm">
              <input type="checkbox" name="ref" value={r.id} /> {r.raw}
            </label>
          ))}
        </fieldset>
        <button className="rounded border border-ink px-2 py-0.5">Split</button>
      </form>
      <p aria-live="polite" className="text-sm">
        {msg}
      </p>
    </div>
  );
}
