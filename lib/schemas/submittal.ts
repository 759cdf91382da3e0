import { z } from "zod";
import { DECISION_OUTCOMES } from "@/lib/documents/decision";

const SHA256 = /^[0-9a-f]{64}$/;

export const issueSchema = z.object({
  roomId: z.string({ error: "Choose the room whose submittal to issue." }).min(1, { error: "Choose the room whose submittal to issue." }).max(64),
  /** the letter the consultant saw and means to issue: if another issue took it first, nothing is issued */
  letter: z.string({ error: "Send the letter of the revision you mean to issue." }).regex(/^[A-Z]{1,4}$/, { error: "Send the letter of the revision you mean to issue, like A or B." }),
  /** the keys of the items (rule breaks, open pins, fire flags) the consultant confirmed */
  confirm: z.array(z.string().max(400), { error: "Send the confirmed items as a list." }).max(5000).default([]),
});

export const decisionSchema = z
  .object({
    outcome: z.enum(DECISION_OUTCOMES, { error: "Choose approve, approve as noted, or return for revision." }),
    signature: z
      .string({ error: "Type your full name to sign." })
      .trim()
      .min(1, { error: "Type your full name to sign." })
      .max(120, { error: "Keep the name under 120 characters." }),
    notes: z.string({ error: "Write the notes as text." }).trim().max(4000, { error: "Keep the notes under 4000 characters." }).default(""),
    pdfSha256: z.string({ error: "Send the SHA-256 of the PDF you read." }).regex(SHA256, { error: "Send the SHA-256 of the PDF you read (64 hexadecimal digits)." }),
  })
  .superRefine((v, ctx) => {
    if (v.outcome !== "approved" && !v.notes) {
      const message = v.outcome === "returned" ? "Say what must change before you return it." : "Write the notes your approval is subject to.";
      ctx.addIssue({ code: "custom", path: ["notes"], message });
    }
  });

export const installedSchema = z.object({
  installed: z.boolean({ error: "Say whether the panel is installed: true or false." }),
});

export type DecisionInput = z.infer<typeof decisionSchema>;
