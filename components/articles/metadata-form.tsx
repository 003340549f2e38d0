"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { articleMetadataSchema, type ArticleMetadataForm } from "@/lib/forms/article";
import { Field, FormError, FormStatus, SelectField, TextareaField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { useFormErrors } from "@/components/ui/use-form-errors";
import { useUpdateArticleMetadata } from "./use-article";

type Venue = { id: string; name: string };
type Initial = {
  title: string | null;
  authors: string[];
  venueId: string | null;
  year: number | null;
  doi: string | null;
  licence: string | null;
};

export function MetadataForm({ articleId, initial, venues }: { articleId: string; initial: Initial; venues: Venue[] }) {
  const router = useRouter();
  const form = useFormErrors(articleMetadataSchema);
  const [saved, setSaved] = useState<string>();
  const update = useUpdateArticleMetadata(articleId);

  return (
    <form
      noValidate
      className="grid gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(undefined);
        const fd = new FormData(e.currentTarget);
        const yearText = String(fd.get("year") ?? "").trim();
        const input: ArticleMetadataForm = {
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
        if (!form.check(input)) return;
        // The raw input goes out: the handler trims and empties to null with the same schema.
        update.mutate(input, {
          onSuccess: () => {
            setSaved("Saved.");
            router.refresh();
          },
          onError: form.fail,
        });
      }}
    >
      <Field label="Title" name="title" defaultValue={initial.title ?? ""} error={form.errors.title} />
      <TextareaField
        label="Authors (one per line)"
        name="authors"
        rows={3}
        defaultValue={initial.authors.join("\n")}
        error={form.errors.authors}
      />
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField label="Venue" name="venueId" defaultValue={initial.venueId ?? ""} error={form.errors.venueId}>
          <option value="">(none)</option>
          {venues.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </SelectField>
        <Field
          label="Year"
          name="year"
          inputMode="numeric"
          defaultValue={initial.year ?? ""}
          error={form.errors.year}
        />
        <Field label="DOI" name="doi" defaultValue={initial.doi ?? ""} error={form.errors.doi} />
      </div>
      <Field
        label="Licence"
        name="licence"
        hint="Required before the article counts in dashboards; it must allow text mining."
        defaultValue={initial.licence ?? ""}
        placeholder="e.g. CC BY 4.0"
        error={form.errors.licence}
      />
      <FormError message={form.errors.form} />
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={update.isPending}>
          Save metadata
        </Button>
        <FormStatus message={saved} />
      </div>
    </form>
  );
}
