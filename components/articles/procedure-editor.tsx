"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { procedureSchema } from "@/lib/forms/procedure";
import { Field, FormError, FormStatus, TextareaField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { useFormErrors } from "@/components/ui/use-form-errors";
import { useSaveProcedure } from "./use-procedures";

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

const lines = (v: FormDataEntryValue | null) =>
  String(v ?? "")
    .split("\n")
    .map((s) => s.trim())
    .filter(Boolean);

/** Edit or add one known misdescribed procedure; patterns are regular expressions, one per line. */
export function ProcedureEditor({ proc }: { proc: Proc | null }) {
  const router = useRouter();
  const form = useFormErrors(procedureSchema);
  const [saved, setSaved] = useState<string>();
  const save = useSaveProcedure(proc?.id);
  const mono = "font-mono text-sm";
  return (
    <form
      noValidate
      className="grid gap-1 rounded border border-rule p-4"
      aria-label={proc ? `Procedure ${proc.label}` : "Add a procedure"}
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(undefined);
        const fd = new FormData(e.currentTarget);
        const data = form.check({
          key: String(fd.get("key") ?? ""),
          label: String(fd.get("label") ?? ""),
          description: String(fd.get("description") ?? ""),
          allOf: lines(fd.get("allOf")),
          anyOf: lines(fd.get("anyOf")),
          noneOf: lines(fd.get("noneOf")),
          enabled: fd.get("enabled") === "on",
        });
        if (!data) return;
        save.mutate(data, {
          onSuccess: () => {
            setSaved("Saved. Workers use it from the next article they mine.");
            router.refresh();
          },
          onError: form.fail,
        });
      }}
    >
      <div className="grid gap-2 sm:grid-cols-2">
        <Field label="Key" name="key" className={mono} defaultValue={proc?.key ?? ""} error={form.errors.key} />
        <Field label="Label" name="label" defaultValue={proc?.label ?? ""} error={form.errors.label} />
      </div>
      <TextareaField
        label="What is misdescribed"
        name="description"
        rows={2}
        defaultValue={proc?.description ?? ""}
        error={form.errors.description}
      />
      <div className="grid gap-2 sm:grid-cols-3">
        <TextareaField
          label="All of (each must match)"
          name="allOf"
          rows={3}
          className={mono}
          defaultValue={proc?.allOf.join("\n") ?? ""}
          error={form.errors.allOf}
        />
        <TextareaField
          label="Any of (one must match)"
          name="anyOf"
          rows={3}
          className={mono}
          defaultValue={proc?.anyOf?.join("\n") ?? ""}
          error={form.errors.anyOf}
        />
        <TextareaField
          label="None of (excludes)"
          name="noneOf"
          rows={3}
          className={mono}
          defaultValue={proc?.noneOf?.join("\n") ?? ""}
          error={form.errors.noneOf}
        />
      </div>
      <FormError message={form.errors.form} />
      <div className="flex items-center gap-4">
        <label className="flex items-center gap-2">
          <input type="checkbox" name="enabled" defaultChecked={proc?.enabled ?? true} /> Enabled
        </label>
        <Button type="submit" disabled={save.isPending}>
          {proc?.id ? "Save" : "Add procedure"}
        </Button>
        <FormStatus message={saved} />
      </div>
    </form>
  );
}
