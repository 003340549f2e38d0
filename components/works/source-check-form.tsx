"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sourceCheckSchema } from "@/lib/forms/source-check";
import { LABELS, SOURCE_CHECK_VERDICTS } from "@/lib/vocabulary";
import { ChoiceField, Field, FormError, FormStatus, SelectField, TextareaField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { useFormErrors } from "@/components/ui/use-form-errors";
import { useRecordSourceCheck } from "./use-work";

type Practice = { id: string; label: string };

const VERDICT_OPTIONS = SOURCE_CHECK_VERDICTS.map((v) => ({ value: v, label: LABELS.sourceCheckVerdict[v] }));

/**
 * A curator records what the work says for a practice. This is the form to copy: one zod schema in
 * lib/forms/ (shared with the route handler), `useFormErrors` for field errors and the server's
 * answer, `Field`-style controls, and a react-query mutation from the feature's hook file. Nothing is
 * pre-selected: the practice and the verdict are the curator's choice.
 */
export function SourceCheckForm({ workId, practices }: { workId: string; practices: Practice[] }) {
  const router = useRouter();
  const form = useFormErrors(sourceCheckSchema);
  const [saved, setSaved] = useState<string>();
  const record = useRecordSourceCheck(workId);
  return (
    <form
      noValidate
      className="grid gap-2 rounded border border-rule p-3"
      aria-labelledby="source-check-h"
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(undefined);
        const fd = new FormData(e.currentTarget);
        const text = (k: string) => String(fd.get(k) ?? "").trim();
        const data = form.check({
          workId,
          practiceId: text("practiceId"),
          verdict: fd.get("verdict") ?? undefined,
          page: text("page") || null,
          quote: text("quote") || null,
          statedValue: text("statedValue") === "" ? null : text("statedValue"),
        });
        if (!data) return;
        record.mutate(data, {
          onSuccess: () => {
            setSaved("Saved. Trails of this practice are being rebuilt.");
            router.refresh();
          },
          onError: form.fail,
        });
      }}
    >
      <h3 id="source-check-h" className="font-medium">
        Record what this work says
      </h3>
      <SelectField label="Practice" name="practiceId" defaultValue="" error={form.errors.practiceId}>
        <option value="" disabled>
          Choose a practice…
        </option>
        {practices.map((p) => (
          <option key={p.id} value={p.id}>
            {p.label}
          </option>
        ))}
      </SelectField>
      <ChoiceField label="What the work says" name="verdict" options={VERDICT_OPTIONS} error={form.errors.verdict} />
      <div className="grid gap-2 sm:grid-cols-2">
        <Field label="Page" name="page" hint="Needed for “Says so” and “Says otherwise”." error={form.errors.page} />
        <Field
          label="Value the work states"
          name="statedValue"
          inputMode="decimal"
          hint="Optional, e.g. 0.70"
          error={form.errors.statedValue}
        />
      </div>
      <TextareaField label="Short quote" name="quote" maxLength={600} rows={2} error={form.errors.quote} />
      <FormError message={form.errors.form ?? form.errors.workId} />
      <FormStatus message={saved} />
      <div>
        <Button type="submit" disabled={record.isPending}>
          Save source check
        </Button>
      </div>
    </form>
  );
}
