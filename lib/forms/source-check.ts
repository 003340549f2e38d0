import { z } from "zod";
import { SOURCE_CHECK_VERDICTS } from "@/lib/vocabulary";

/**
 * A curator's record of what a cited work says for a practice. No verdict is assumed: the form
 * starts with none chosen and this schema refuses to save until one is.
 */
export const sourceCheckSchema = z
  .object({
    workId: z.uuid(),
    practiceId: z.uuid({ message: "Choose a practice." }),
    verdict: z.enum(SOURCE_CHECK_VERDICTS, { message: "Choose what the work says." }),
    page: z.string().trim().max(40, "Keep the page under 40 characters.").optional().nullable(),
    quote: z.string().trim().max(600, "Keep the quote short (under 600 characters).").optional().nullable(),
    statedValue: z.coerce
      .number({ message: "Enter the stated value as a number, e.g. 0.70." })
      .refine(Number.isFinite, "Enter a finite number.")
      .optional()
      .nullable(),
  })
  .refine((v) => !(v.verdict === "says_so" || v.verdict === "says_otherwise") || !!v.page, {
    message: "Give the page where the source says it.",
    path: ["page"],
  });
export type SourceCheckForm = z.input<typeof sourceCheckSchema>;
