import { z } from "zod";
import { STATISTIC_KEYS } from "@/lib/practices";

/** The practice form (curators): one schema for the browser and the route handler. */
export const practiceFormSchema = z.object({
  statistic: z.enum(STATISTIC_KEYS, { message: "Choose a statistic." }),
  comparator: z.enum([">=", ">", "<=", "<", "="], { message: "Choose a comparator." }),
  value: z.coerce
    .number({ message: "Enter the cut-off as a number, e.g. 0.70." })
    .refine(Number.isFinite, "Enter a finite number."),
  framing: z.enum(["fixed", "contextual"]).nullable().optional(),
  label: z.string().max(200, "Keep the label under 200 characters.").optional(),
});
export type PracticeForm = z.infer<typeof practiceFormSchema>;

export const sourceCheckSchema = z
  .object({
    workId: z.uuid(),
    practiceId: z.uuid({ message: "Choose a practice." }),
    verdict: z.enum(["says_so", "says_otherwise", "silent", "not_checked"]),
    page: z.string().trim().max(40).optional().nullable(),
    quote: z.string().trim().max(600, "Keep the quote short (under 600 characters).").optional().nullable(),
    statedValue: z.coerce.number().refine(Number.isFinite).optional().nullable(),
  })
  .refine((v) => !(v.verdict === "says_so" || v.verdict === "says_otherwise") || !!v.page, {
    message: "Give the page where the source says it.",
    path: ["page"],
  });
