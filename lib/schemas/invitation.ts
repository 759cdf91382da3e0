import { z } from "zod";
import { PROJECT_ROLES } from "@/lib/roles";
import { emailField, nameField } from "./common";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";

export const inviteToProjectSchema = z.object({
  email: emailField,
  role: z.enum(PROJECT_ROLES, { error: "Choose a role: consultant, architect, installer or client." }),
  message: z.string().trim().max(1000, { error: "Keep the message under 1000 characters." }).optional().default(""),
});
export type InviteToProjectInput = z.infer<typeof inviteToProjectSchema>;

export const inviteToFirmSchema = z.object({
  email: emailField,
  message: z.string().trim().max(1000, { error: "Keep the message under 1000 characters." }).optional().default(""),
});
export type InviteToFirmInput = z.infer<typeof inviteToFirmSchema>;

// The sign-up form on the invitation page; the e-mail comes from the invitation itself.
export const inviteSignUpSchema = z
  .object({
    name: nameField,
    password: z
      .string()
      .min(MIN_PASSWORD_LENGTH, { error: `Use at least ${MIN_PASSWORD_LENGTH} characters for the password.` })
      .max(128, { error: "Keep the password under 128 characters." }),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], error: "The two passwords differ." });
