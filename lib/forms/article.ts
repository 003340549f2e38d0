import { z } from "zod";
import { normaliseDoi } from "@/lib/corpus/doi";

// One schema per form, used by the browser (field errors before sending) and by the route handler.

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Keep it under ${max} characters.`)
    .transform((s) => (s === "" ? null : s));

/** The metadata form, shared by the browser and the route handler. */
export const articleMetadataSchema = z.object({
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
/** What the form sends (before trimming and empty-to-null). */
export type ArticleMetadataForm = z.input<typeof articleMetadataSchema>;
