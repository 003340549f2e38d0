import { z } from "zod";
import { ROLES } from "@/lib/vocabulary";

// One schema per form, used by the browser (field errors before sending) and by the route handler.
export const emailField = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, "At most 254 characters.")
  .email("Enter an e-mail address like name@example.org.");

export const passwordSignInSchema = z.object({
  email: emailField,
  password: z.string().min(1, "Enter your password.").max(200, "At most 200 characters."),
});

export const magicLinkSchema = z.object({ email: emailField });

export const newPasswordField = z.string().min(10, "Use at least 10 characters.").max(200, "At most 200 characters.");

export const acceptInvitationSchema = z
  .object({
    token: z.string().min(20).max(200),
    name: z.string().trim().min(1, "Enter your name.").max(120, "At most 120 characters."),
    password: newPasswordField,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export const roleField = z.enum(ROLES, { message: "Choose a role." });

export const inviteSchema = z.object({
  email: emailField,
  role: roleField,
  venueIds: z.array(z.string().uuid()).max(50).default([]),
});

export const userPatchSchema = z
  .object({
    role: roleField.optional(),
    active: z.boolean().optional(),
    venueIds: z.array(z.string().uuid()).max(50).optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined || v.venueIds !== undefined, {
    message: "Nothing to change.",
  });

export const venueSchema = z.object({
  name: z.string().trim().min(2, "Enter the venue's name.").max(200, "At most 200 characters."),
  abbreviation: z
    .string()
    .trim()
    .max(40, "At most 40 characters.")
    .optional()
    .transform((v) => v || null),
  issn: z
    .string()
    .trim()
    .regex(/^(\d{4}-\d{3}[\dXx])?$/, "Write an ISSN as 1234-567X, or leave it empty.")
    .optional()
    .transform((v) => v || null),
  isMethodsVenue: z.boolean().default(false),
});

export const venuePatchSchema = venueSchema.partial();

export { fieldErrors } from "./errors";
