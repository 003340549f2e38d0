import { z } from "zod";
import { ROLES } from "@/lib/vocabulary";
import { defineJob } from "./define";
import { RETRY } from "./presets";

/**
 * One e-mail. The data names a template and its values; the worker renders it (lib/mail/templates.ts,
 * every value escaped) and sends it through SMTP, retrying while the server is unreachable.
 *
 * The job's data holds the link, and so the one-time token in it, for as long as pg-boss keeps the
 * job (its retention); a resent invitation gets a new token, which ends the old one.
 */
export const sendMail = defineJob({
  name: "send-mail",
  schema: z.discriminatedUnion("template", [
    z.object({
      template: z.literal("invitation"),
      to: z.email(),
      link: z.url(),
      role: z.enum(ROLES),
      inviter: z.string().min(1).max(300),
    }),
    z.object({ template: z.literal("sign-in"), to: z.email(), link: z.url() }),
  ]),
  preset: RETRY.mail,
});

export type MailJobData = z.infer<typeof sendMail.schema>;
