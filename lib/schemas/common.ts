import { z } from "zod";

export const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@firm.example." }));

export const nameField = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, { error: "Enter a name." })
  .max(120, { error: "Keep the name under 120 characters." });

export const idParam = z.string().min(1).max(64);
