import { z } from "zod";
import { ASSERTING_FRAMINGS, COMPARATORS, STATISTIC_KEYS } from "@/lib/vocabulary";

/**
 * The practice form (curators): one schema for the browser and the route handler. A practice is
 * asserted, so its framing is one that asserts (a disputed statement never matches a practice).
 */
export const practiceFormSchema = z.object({
  statistic: z.enum(STATISTIC_KEYS, { message: "Choose a statistic." }),
  comparator: z.enum(COMPARATORS, { message: "Choose a comparator." }),
  value: z.coerce
    .number({ message: "Enter the cut-off as a number, e.g. 0.70." })
    .refine(Number.isFinite, "Enter a finite number."),
  framing: z.enum(ASSERTING_FRAMINGS).nullable().optional(),
  label: z.string().max(200, "Keep the label under 200 characters.").optional(),
});
export type PracticeForm = z.infer<typeof practiceFormSchema>;
