"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { practiceFormSchema } from "@/lib/graph/practice-form";
import { STATISTIC_KEYS } from "@/lib/practices";

/** Curators define a practice; statements are matched to it in the background. */
export function PracticeForm() {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState("");
  return (
    <form
      aria-label="Define a practice"
      className="space-y-2 rounded border border-rule p-3"
      onSubmit={async (e) => {
        e.preventDefault();
        const fd = Object.fromEntries(new FormData(e.currentTarget));
        const parsed = practiceFormSchema.safeParse({
          ...fd,
          framing: fd.framing || null,
          label: fd.label || undefined,
        });
        if (!parsed.success) {
          setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
          return;
        }
        setErrors({});
        const r = await fetch("/api/practices", {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify(parsed.data),
        });
        const body = await r.json().catch(() => null);
        if (!r.ok)
          setErrors({ [body?.error?.field ?? "form"]: body?.error?.message ?? "Could not save the practice." });
        else {
          setStatus(`Saved “${body.label}”. Statements are being matched to it.`);
          router.refresh();
        }
      }}
    >
      <h2 className="font-medium">Define a practice</h2>
      <label className="mr-2">
        Statistic{" "}
        <select name="statistic" className="rounded border border-rule bg-paper" aria-describedby="err-statistic">
          {STATISTIC_KEYS.map((s) => (
            <option key={s}>{s}</option>
          ))}
        </select>
      </label>
      <label className="mr-2">
        Comparator{" "}
        <select name="comparator" className="rounded border border-rule bg-paper" aria-describedby="err-comparator">
          {[">=", ">", "<=", "<", "="].map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
      </label>
      <label className="mr-2">
        Value{" "}
        <input
          name="value"
          inputMode="decimal"
          className="w-20 rounded border border-rule bg-paper"
          aria-describedby="err-value"
        />
      </label>
      <label className="mr-2">
        Framing{" "}
        <select name="framing" className="rounded border border-rule bg-paper">
          <option value="">any</option>
          <option value="fixed">fixed rule</option>
          <option value="contextual">depends on context</option>
        </select>
      </label>
      <label className="block">
        Label (optional){" "}
        <input name="label" className="w-96 rounded border border-rule bg-paper" aria-describedby="err-label" />
      </label>
      <div aria-live="polite" className="text-sm">
        {Object.entries(errors).map(([k, m]) => (
          <p key={k} id={`err-${k}`} className="text-accent">
            {m}
          </p>
        ))}
        {status && <p>{status}</p>}
      </div>
      <button className="rounded bg-ink px-3 py-1.5 text-paper">Save practice</button>
    </form>
  );
}
