"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { practiceFormSchema } from "@/lib/forms/practice";
import { ASSERTING_FRAMINGS, COMPARATORS, LABELS, STATISTIC_KEYS } from "@/lib/vocabulary";
import { Field, FormError, FormStatus, SelectField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { useFormErrors } from "@/components/ui/use-form-errors";
import { useCreatePractice } from "./use-practices";

/** Curators define a practice; statements are matched to it in the background. */
export function PracticeForm() {
  const router = useRouter();
  const form = useFormErrors(practiceFormSchema);
  const [saved, setSaved] = useState<string>();
  const create = useCreatePractice();
  return (
    <form
      noValidate
      aria-labelledby="practice-form-h"
      className="grid gap-2 rounded border border-rule p-3"
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(undefined);
        const fd = new FormData(e.currentTarget);
        const text = (k: string) => String(fd.get(k) ?? "").trim();
        const data = form.check({
          statistic: text("statistic") || undefined,
          comparator: text("comparator") || undefined,
          value: text("value") === "" ? undefined : text("value"),
          framing: text("framing") || null,
          label: text("label") || undefined,
        });
        if (!data) return;
        create.mutate(data, {
          onSuccess: (row) => {
            setSaved(`Saved “${row.label}”. Statements are being matched to it.`);
            router.refresh();
          },
          onError: form.fail,
        });
      }}
    >
      <h2 id="practice-form-h" className="font-medium">
        Define a practice
      </h2>
      <div className="flex flex-wrap gap-3">
        <SelectField label="Statistic" name="statistic" defaultValue="" error={form.errors.statistic}>
          <option value="" disabled>
            Choose a statistic…
          </option>
          {STATISTIC_KEYS.filter((s) => s !== "other").map((s) => (
            <option key={s} value={s}>
              {LABELS.statistic[s]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Comparator" name="comparator" defaultValue="" error={form.errors.comparator}>
          <option value="" disabled>
            Choose…
          </option>
          {COMPARATORS.map((c) => (
            <option key={c} value={c}>
              {LABELS.comparator[c]} ({LABELS.comparatorWords[c]})
            </option>
          ))}
        </SelectField>
        <Field label="Value" name="value" inputMode="decimal" className="w-24" error={form.errors.value} />
        <SelectField label="Framing" name="framing" defaultValue="" error={form.errors.framing}>
          <option value="">Any framing</option>
          {ASSERTING_FRAMINGS.map((f) => (
            <option key={f} value={f}>
              {LABELS.framing[f]}
            </option>
          ))}
        </SelectField>
      </div>
      <Field
        label="Label (optional)"
        name="label"
        className="max-w-xl"
        hint="Left empty, the label is written from the rule, e.g. “Cronbach's α ≥ .70, as a fixed rule”."
        error={form.errors.label}
      />
      <FormError message={form.errors.form} />
      <FormStatus message={saved} />
      <div>
        <Button type="submit" disabled={create.isPending}>
          Save practice
        </Button>
      </div>
    </form>
  );
}
