import { z } from "zod";
import { WORK_TYPES } from "@/lib/vocabulary";

// The curator's three small work forms. The route handlers keep their own body schemas; these give the
// browser the same rules and messages before it sends anything.
export const workTypeSchema = z.object({ workType: z.enum(WORK_TYPES, { message: "Choose a type." }) });
export const mergeWorkSchema = z.object({
  intoId: z.uuid({ message: "Paste the id of the work to merge into (from its page address)." }),
});
export const splitWorkSchema = z.object({
  referenceIds: z.array(z.uuid()).min(1, "Tick at least one reference to split off."),
});
