"use client";
import { useId, useState } from "react";
import { useRouter } from "next/navigation";
import { ProcedureInput } from "@/lib/corpus/schemas";

type Proc = {
  id?: string;
  key: string;
  label: string;
  description: string;
  allOf: string[];
  anyOf?: string[];
  noneOf?: string[];
  enabled: boolean;
};
type Field = "key" | "label" | "description" | "allOf" | "anyOf" | "noneOf";

/** Edit or add one known misdescribed procedure; patterns are regular expressions, one per line. */
export function ProcedureEditor({ proc }: { proc: Proc | null }) {
  const router = useRouter();
  const id = useId();
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [note, setNote] = useState<string | null>(null);
  const lines = (v: FormDataEntryValue | null) =>
    String(v ?? "")
      .split("\n")
      .map((s) => s.trim())
      .filter(Boolean);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const fd = new FormData(e.currentTarget);
    const input = {
      key: String(fd.get("key") ?? ""),
      label: String(fd.get("label") ?? ""),
      description: String(fd.get("description") ?? ""),
      allOf: lines(fd.get("allOf")),
      anyOf: lines(fd.get("anyOf")),
      noneOf: lines(fd.get("noneOf")),
      enabled: fd.get("enabled") === "on",
    };
    const r = ProcedureInput.safeParse(input);
    if (!r.success) {
      const next: Partial<Record<Field, string>> = {};
      for (const i of r.error.issues) next[i.path[0] as Field] ??= i.message;
      setErrors(next);
      return;
    }
    setErrors({});
    const res = await fetch(proc?.id ? `/api/procedures/${proc.id}` : "/api/procedures", {
      method: proc?.id ? "PUT" : "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(r.data),
    });
    if (res.ok) {
      setNote("Saved. Workers use it from the next article they mine.");
      router.refresh();
    } else {
      const b = (await res.json().catch(() => null)) as { error?: { message?: string; field?: string } } | null;
      setErrors({ [(b?.error?.field ?? "label").split(".")[0] as Field]: b?.error?.message ?? "Could not save." });
    }
  }
  const f = (name: Field) => ({
    id: `${id}-${name}`,
    name,
    "aria-invalid": errors[name] ? true : undefined,
    "aria-describedby": `${id}-${name}-e`,
    className: "w-full rounded border border-rule bg-paper px-2 py-1 font-mono text-sm",
  });
  const err = (name: Field) => (
    <span id={`${id}-${name}-e`} className="text-sm text-accent" aria-live="polite">
      {errors[name] ?? ""}
    </span>
  );
  return (
    <form onSubmit={submit} noValidate className="grid gap-2 rounded border border-rule p-4">
      <div className="grid gap-2 sm:grid-cols-2">
        <label className="grid gap-1">
          <span>Key</span>
          <input {...f("key")} defaultValue={proc?.key ?? ""} />
          {err("key")}
        </label>
        <label className="grid gap-1">
          <span>Label</span>
          <input {...f("label")} defaultValue={proc?.label ?? ""} />
          {err("label")}
        </label>
      </div>
      <label className="grid gap-1">
        <span>What is misdescribed</span>
        <textarea {...f("description")} rows={2} defaultValue={proc?.description ?? ""} />
        {err("description")}
      </label>
      <div className="grid gap-2 sm:grid-cols-3">
        <label className="grid gap-1">
          <span>All of (each must match)</span>
          <textarea {...f("allOf")} rows={3} defaultValue={proc?.allOf.join("\n") ?? ""} />
          {err("allOf")}
        </label>
        <label className="grid gap-1">
          <span>Any of (one must match)</span>
          <textarea {...f("anyOf")} rows={3} defaultValue={proc?.anyOf?.join("\n") ?? ""} />
          {err("anyOf")}
        </label>
        <label className="grid gap-1">
          <span>None of (excludes)</span>
          <textarea {...f("noneOf")} rows={3} defaultValue={proc?.noneOf?.join("\n") ?? ""} />
          {err("noneOf")}
        </label>
      </div>
      <div className="flex items-center gap-4">
        <label className="flex items-center gap-2">
          <input type="checkbox" name="enabled" defaultChecked={proc?.enabled ?? true} /> Enabled
        </label>
        <button type="submit" className="rounded bg-ink px-3 py-1.5 text-paper">
          {proc?.id ? "Save" : "Add procedure"}
        </button>
        <span aria-live="polite" className="text-sm">
          {note}
        </span>
      </div>
    </form>
  );
}
