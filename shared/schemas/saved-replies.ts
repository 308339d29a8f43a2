import { z } from "zod";
import { SPECIES, SPECIES_FACTS, speciesSchema, type Species } from "../engine/index.ts";

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
/**
 * `missing` names placeholders the plan has no value for yet (e.g. no first mow date); they read as a plain phrase.
 * `speciesNotInLawn`: grasses the reply names that neither the lawn nor the visit's seed mix has, for the
 * technician to fix before sending.
 */
export const renderedReplySchema = z.object({
  text: z.string(),
  missing: z.array(z.enum(SAVED_REPLY_PLACEHOLDERS)),
  speciesNotInLawn: z.array(speciesSchema),
});

/*
 * How people write each grass in a reply. "Fescue" alone could be tall or fine fescue, so it
 * names neither; "annual ryegrass" and "annual bluegrass" are other plants.
 */
const SPECIES_WORDS: Readonly<Record<Species, readonly string[]>> = {
  tall_fescue: ["tall fescue"],
  kentucky_bluegrass: ["kentucky bluegrass", "(?<!annual )bluegrass"],
  perennial_ryegrass: ["perennial ryegrass", "perennial rye", "(?<!annual )ryegrass", "(?<!annual )rye grass"],
  fine_fescue: ["fine fescues?", "creeping red fescue", "red fescue", "chewings fescue", "hard fescue"],
  bermudagrass: ["bermudagrass", "bermuda grass", "bermuda"],
  zoysiagrass: ["zoysiagrass", "zoysia"],
  st_augustinegrass: ["st\\.? ?augustine(?:grass)?", "saint augustine(?:grass)?"],
  centipedegrass: ["centipedegrass", "centipede grass", "centipede"],
  bahiagrass: ["bahiagrass", "bahia grass", "bahia"],
};
const SPECIES_PATTERNS = SPECIES.map((species) => ({ species, pattern: new RegExp(`\\b(?:${SPECIES_WORDS[species].join("|")})\\b`, "i") }));

/** The grasses a reply's text names, in the engine's order. */
export function speciesNamedIn(text: string): Species[] {
  return SPECIES_PATTERNS.filter(({ pattern }) => pattern.test(text)).map(({ species }) => species);
}

/**
 * Grasses a reply names that this lawn doesn't have. The lawn's species and the visit's seed mix
 * count; a lawn recorded only as cool- or warm-season flags grasses of the other season; a lawn
 * with neither flags nothing, since nothing is known to contradict.
 */
export function speciesNotInLawn(text: string, lawn: { species: readonly Species[]; season?: "cool" | "warm" }): Species[] {
  const named = speciesNamedIn(text);
  if (lawn.species.length > 0) return named.filter((s) => !lawn.species.includes(s));
  return lawn.season ? named.filter((s) => SPECIES_FACTS[s].season !== lawn.season) : [];
}
