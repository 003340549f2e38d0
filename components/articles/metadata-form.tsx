"use client";
import { useId, useState } from "react";
import { useRouter } from "next/navigation";
import { ArticleMetadataInput } from "@/lib/corpus/schemas";

type Venue = { id: string; name: string };
type Initial = {
  title: string | null;
  authors: string[];
  venueId: string | null;
  year: number | null;
  doi: string | null;
  licence: string | null;
};
type Field = "title" | "authors" | "venueId" | "year" | "doi" | "licence";

export function MetadataForm({ articleId, initial, venues }: { articleId: string; initial: Initial; venues: Venue[] }) {
  const router = useRouter();
  const id = useId();
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setSaved(null);
    const fd = new FormData(e.currentTarget);
    const yearText = String(fd.get("year") ?? "").trim();
    const input = {
      title: String(fd.get("title") ?? ""),
      authors: String(fd.get("authors") ?? "")
        .split("\n")
        .map((a) => a.trim())
        .filter(Boolean),
      venueId: String(fd.get("venueId") ?? "") || null,
      year: yearText === "" ? null : Number(yearText),
      doi: String(fd.get("doi") ?? ""),
      licence: String(fd.get("licence") ?? ""),
    };
    const r = ArticleMetadataInput.safeParse(input);
    if (!r.success) {
      const next: Partial<Record<Field, string>> = {};
      for (const issue of r.error.issues) next[(issue.path[0] as Field) ?? "title"] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    setBusy(true);
    const res = await fetch(`/api/articles/${articleId}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(input),
    });
    setBusy(false);
    if (res.ok) {
      setSaved("Saved.");
      router.refresh();
    } else {
      const body = (await res.json().catch(() => null)) as { error?: { message?: string; field?: string } } | null;
      const field = (body?.error?.field?.split(".")[0] ?? "title") as Field;
      setErrors({ [field]: body?.error?.message ?? "Could not save." });
    }
  }

  const f = (name: Field) => ({
    id: `${id}-${name}`,
    name,
    "aria-invalid": errors[name] ? true : undefined,
    "aria-describedby": errors[name] ? `${id}-${name}-error` : undefined,
    className: "w-full rounded border border-rule bg-paper px-2 py-1",
  });
  const err = (name: Field) => (
    <span id={`${id}-${name}-error`} className="text-sm text-accent" aria-live="polite">
      {errors[name] ?? ""}
    </span>
  );

  return (
    <form onSubmit={submit} className="grid gap-3" noValidate>
      <label className="grid gap-1">
        <span>Title</span>
        <input {...f("title")} defaultValue={initial.title ?? ""} />
        {err("title")}
      </label>
      <label className="grid gap-1">
        <span>Authors (one per line)</span>
        <textarea {...f("authors")} rows={3} defaultValue={initial.authors.join("\n")} />
        {err("authors")}
      </label>
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="grid gap-1">
          <span>Venue</span>
          <select {...f("venueId")} defaultValue={initial.venueId ?? ""}>
            <option value="">(none)</option>
            {venues.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name}
              </option>
            ))}
          </select>
          {err("venueId")}
        </label>
        <label className="grid gap-1">
          <span>Year</span>
          <input {...f("year")} inputMode="numeric" defaultValue={initial.year ?? ""} />
          {err("year")}
        </label>
        <label className="grid gap-1">
          <span>DOI</span>
          <input {...f("doi")} defaultValue={initial.doi ?? ""} />
          {err("doi")}
        </label>
      </div>
      <label className="grid gap-1">
        <span>Licence (required before the article counts in dashboards)</span>
        <input {...f("licence")} defaultValue={initial.licence ?? ""} placeholder="e.g. CC BY 4.0" />
        {err("licence")}
      </label>
      <div className="flex items-center gap-3">
        <button type="submit" disabled={busy} className="rounded bg-ink px-3 py-1.5 text-paper disabled:opacity-60">
          Save metadata
        </button>
        <span aria-live="polite" className="text-sm">
          {saved}
        </span>
      </div>
    </form>
  );
}
