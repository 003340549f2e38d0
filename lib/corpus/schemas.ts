// The form schemas live in lib/forms/ (one per form); these names stay for the route handlers.
import { z } from "zod";
import { articleMetadataSchema } from "@/lib/forms/article";
import { procedureSchema } from "@/lib/forms/procedure";

export const ArticleMetadataInput = articleMetadataSchema;
export type ArticleMetadataInput = z.infer<typeof ArticleMetadataInput>;
export const ProcedureInput = procedureSchema;
export type ProcedureInput = z.infer<typeof ProcedureInput>;

export const ReviewInput = z.object({
  verdict: z.enum(["correct", "incorrect"]),
  note: z.string().trim().max(2000).optional(),
});
