"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { mergeWorkSchema, splitWorkSchema, workTypeSchema } from "@/lib/forms/work";
import { LABELS, WORK_TYPES, type WorkType } from "@/lib/vocabulary";
import { Field, FormError, FormStatus, SelectField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { useFormErrors } from "@/components/ui/use-form-errors";
import { useMergeWork, useSetWorkType, useSplitWork } from "./use-work";

export { SourceCheckForm } from "./source-check-form";

/** A curator retypes the work, merges it into another, or splits wrongly matched references off. */
export function CurateWork({
  workId,
  workType,
  references,
}: {
  workId: string;
  workType: WorkType;
  references: { id: string; raw: string }[];
}) {
  const router = useRouter();
  const [saved, setSaved] = useState<string>();
  const typeForm = useFormErrors(workTypeSchema);
  const mergeForm = useFormErrors(mergeWorkSchema);
  const splitForm = useFormErrors(splitWorkSchema);
  const setType = useSetWorkType(workId);
  const merge = useMergeWork(workId);
  const split = useSplitWork(workId);
  return (
    <div className="grid gap-4 rounded border border-rule p-3">
      <h3 className="font-medium">Curate this work</h3>
      <form
        noValidate
        className="flex flex-wrap items-end gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          setSaved(undefined);
          const data = typeForm.check({ workType: new FormData(e.currentTarget).get("workType") });
          if (!data) return;
          setType.mutate(data.workType, {
            onSuccess: () => {
              setSaved("Type saved; trails are being rebuilt.");
              router.refresh();
            },
            onError: typeForm.fail,
          });
        }}
      >
        <SelectField label="Type" name="workType" defaultValue={workType} error={typeForm.errors.workType}>
          {WORK_TYPES.map((t) => (
            <option key={t} value={t}>
              {LABELS.workType[t]}
            </option>
          ))}
        </SelectField>
        <Button type="submit" variant="quiet" className="mb-6" disabled={setType.isPending}>
          Set type
        </Button>
        <FormError message={typeForm.errors.form} />
      </form>
      <form
        noValidate
        className="flex flex-wrap items-end gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          setSaved(undefined);
          const data = mergeForm.check({ intoId: String(new FormData(e.currentTarget).get("intoId") ?? "").trim() });
          if (!data) return;
          merge.mutate(data.intoId, { onSuccess: (r) => router.push(`/works/${r.workId}`), onError: mergeForm.fail });
        }}
      >
        <Field label="Merge into work id" name="intoId" className="w-96" error={mergeForm.errors.intoId} />
        <Button type="submit" variant="quiet" className="mb-6" disabled={merge.isPending}>
          Merge
        </Button>
        <FormError message={mergeForm.errors.form} />
      </form>
      <form
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          setSaved(undefined);
          const data = splitForm.check({ referenceIds: new FormData(e.currentTarget).getAll("ref").map(String) });
          if (!data) return;
          split.mutate(data.referenceIds, {
            onSuccess: () => {
              setSaved("Split off into a new work.");
              router.refresh();
            },
            onError: splitForm.fail,
          });
        }}
      >
        <fieldset aria-describedby="split-err">
          <legend className="text-sm font-medium">Split wrongly matched references off</legend>
          <div className="max-h-64 overflow-auto">
            {references.map((r) => (
              <label key={r.id} className="block text-sm">
                <input type="checkbox" name="ref" value={r.id} /> {r.raw}
              </label>
            ))}
          </div>
          <p id="split-err" aria-live="polite" className="text-sm text-accent min-h-[1.25rem]">
            {splitForm.errors.referenceIds ?? splitForm.errors.form ?? ""}
          </p>
        </fieldset>
        <Button type="submit" variant="quiet" disabled={split.isPending}>
          Split
        </Button>
      </form>
      <FormStatus message={saved} />
    </div>
  );
}
