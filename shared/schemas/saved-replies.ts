import { z } from "zod";

/** What a saved reply may say about the customer and their plan; filled in when a technician uses it. */
export const SAVED_REPLY_PLACEHOLDERS = ["firstName", "visitDate", "firstMowDate", "companyName"] as const;
export type SavedReplyPlaceholder = (typeof SAVED_REPLY_PLACEHOLDERS)[number];

const placeholderPattern = /\{\{\s*([A-Za-z]+)\s*\}\}/g;

/** Placeholders in a text that we cannot fill (usually a typo such as {{firstname}}). */
export function unknownPlaceholders(body: string): string[] {
  const known = new Set<string>(SAVED_REPLY_PLACEHOLDERS);
  return [...new Set([...body.matchAll(placeholderPattern)].map((m) => m[1]!).filter((name) => !known.has(name)))];
}

/** Fills every known placeholder; unknown ones are left as typed so nobody sends a silently changed text. */
export function fillPlaceholders(body: string, values: Record<SavedReplyPlaceholder, string>): string {
  return body.replace(placeholderPattern, (whole, name: string) => (name in values ? values[name as SavedReplyPlaceholder] : whole));
}

export const savedReplyInputSchema = z
  .object({
    title: z.string().trim().min(1, "Give the reply a title").max(120, "Keep the title under 120 characters"),
    body: z.string().trim().min(1, "Write the reply").max(4000, "Keep the reply under 4,000 characters"),
  })
  .superRefine((reply, ctx) => {
    const unknown = unknownPlaceholders(reply.body);
    if (unknown.length) {
      ctx.addIssue({
        code: "custom",
        path: ["body"],
        message: `Unknown placeholder ${unknown.map((u) => `{{${u}}}`).join(", ")}; use ${SAVED_REPLY_PLACEHOLDERS.map((p) => `{{${p}}}`).join(", ")}`,
      });
    }
  });
export type SavedReplyInput = z.infer<typeof savedReplyInputSchema>;

export const renderSavedReplySchema = z.object({ planId: z.number().int().positive().max(2_147_483_647) });

export const savedReplySchema = z.object({
  id: z.number().int(),
  title: z.string(),
  body: z.string(),
  updatedAt: z.string(),
  createdByName: z.string().nullable(),
});
export type SavedReply = z.infer<typeof savedReplySchema>;

export const savedReplyListSchema = z.object({ replies: z.array(savedReplySchema) });
export const savedReplyResponseSchema = z.object({ reply: savedReplySchema });
/** `missing` names placeholders the plan has no value for yet (e.g. no first mow date); they read as a plain phrase. */
export const renderedReplySchema = z.object({ text: z.string(), missing: z.array(z.enum(SAVED_REPLY_PLACEHOLDERS)) });
