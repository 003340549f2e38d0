"use client";
import { useState } from "react";
import type { z } from "zod";
import { fieldErrors } from "@/lib/forms/errors";
import { formErrorsOf } from "@/lib/http/fetch-json";

/**
 * The error state of one form: `check` runs the form's zod schema (one per form, in lib/forms/) and
 * shows its messages by field; `fail` maps a failed request the one way every form does (the field
 * the server named, else the whole form).
 */
export function useFormErrors<S extends z.ZodType>(schema: S) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  return {
    errors,
    check(input: unknown): z.output<S> | null {
      const r = schema.safeParse(input);
      if (!r.success) {
        setErrors(fieldErrors(r.error));
        return null;
      }
      setErrors({});
      return r.data;
    },
    fail: (e: Error) => setErrors(formErrorsOf(e)),
    clear: () => setErrors({}),
  };
}
