// Form schemas shared by the browser and the route handlers (nothing server-only may be imported here).
import { z } from "zod";
import { normaliseDoi } from "./doi";

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Keep it under ${max} characters.`)
    .transform((s) => (s === "" ? null : s));

/** The metadata form, shared by the browser and the route handler. */
export const ArticleMetadataInput = z.object({
  title: optionalText(1000),
  authors: z.array(z.string().trim().min(1).max(300)).max(200, "At most 200 authors."),
  venueId: z.string().uuid("Choose a venue from the list.").nullable(),
  year: z
    .number({ message: "Enter a year such as 2019." })
    .int("Enter a whole year.")
    .min(1800, "The year must be 1800 or later.")
    .max(2100, "The year must be 2100 or earlier.")
    .nullable(),
  doi: optionalText(300).refine(
    (d) => d === null || normaliseDoi(d) !== null,
    "A DOI starts with 10. and has a slash, e.g. 10.5555/abc.123.",
  ),
  licence: optionalText(500),
});
export type ArticleMetadataInput = z.infer<typeof ArticleMetadataInput>;

export const ReviewInput = z.object({
  verdict: z.enum(["correct", "incorrect"]),
  note: z.string().trim().max(2000).optional(),
});

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

/** One schema for the form and the route handler. */
export const ProcedureInput = z.object({
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
export type ProcedureInput = z.infer<typeof ProcedureInput>;
