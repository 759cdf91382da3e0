import { z } from "zod";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";
import { emailField } from "./common";

// A new password typed twice: the invitation sign-up, the reset page and the settings page.
export const newPasswordField = z
  .string({ error: "Enter a password." })
  .min(MIN_PASSWORD_LENGTH, { error: `Use at least ${MIN_PASSWORD_LENGTH} characters for the password.` })
  .max(MAX_PASSWORD_LENGTH, { error: `Keep the password under ${MAX_PASSWORD_LENGTH} characters.` });

const confirmField = z.string({ error: "Type the password again." });

export const newPasswordShape = { password: newPasswordField, confirm: confirmField };

export const samePasswordTwice = (v: { password: string; confirm: string }) => v.password === v.confirm;
export const TWICE = { path: ["confirm"], error: "The two passwords differ." };

export const requestPasswordResetSchema = z.object({ email: emailField });
export type RequestPasswordResetInput = z.infer<typeof requestPasswordResetSchema>;

export const completePasswordResetSchema = z.object(newPasswordShape).refine(samePasswordTwice, TWICE);
export type CompletePasswordResetInput = z.infer<typeof completePasswordResetSchema>;

export const changePasswordSchema = z
  .object({ currentPassword: z.string({ error: "Enter your current password." }).min(1, { error: "Enter your current password." }), ...newPasswordShape })
  .refine(samePasswordTwice, TWICE)
  .refine((v) => v.password !== v.currentPassword, { path: ["password"], error: "Choose a password different from the current one." });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const setAccountDisabledSchema = z.object({
  disabled: z.boolean({ error: "Say whether the account is disabled: true or false." }),
});
export type SetAccountDisabledInput = z.infer<typeof setAccountDisabledSchema>;
