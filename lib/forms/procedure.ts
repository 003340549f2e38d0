import { z } from "zod";

// One schema per form, used by the browser (field errors before sending) and by the route handler.

const regexSource = z
  .string()
  .trim()
  .min(1, "A pattern cannot be empty.")
  .max(500, "Keep a pattern under 500 characters.")
  .refine((s) => {
    try {
      new RegExp(s, "i");
      return true;
    } catch {
      return false;
    }
  }, "This is not a valid regular expression.");

/** A known misdescribed procedure: patterns are regular expressions, matched without regard to case. */
export const procedureSchema = z.object({
  key: z
    .string()
    .trim()
    .regex(/^[a-z][a-z0-9_]{2,63}$/, "Use 3–64 lower-case letters, digits or underscores, starting with a letter."),
  label: z.string().trim().min(3, "Give a label of at least 3 characters.").max(200),
  description: z.string().trim().min(10, "Describe the misdescription in at least 10 characters.").max(2000),
  allOf: z.array(regexSource).min(1, "At least one pattern must be required (all of)."),
  anyOf: z.array(regexSource).default([]),
  noneOf: z.array(regexSource).default([]),
  enabled: z.boolean().default(true),
});
export type ProcedureForm = z.infer<typeof procedureSchema>;
