import { z } from "zod";
import { PROJECT_ROLES } from "@/lib/roles";
import { emailField, nameField } from "./common";
import { newPasswordShape, samePasswordTwice, TWICE } from "./account";

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
export const inviteSignUpSchema = z.object({ name: nameField, ...newPasswordShape }).refine(samePasswordTwice, TWICE);
export type InviteSignUpInput = z.infer<typeof inviteSignUpSchema>;
