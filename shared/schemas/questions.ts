import { z } from "zod";

/**
 * Photo questions and the conversation thread of a care plan (one thread per plan).
 * Upload: POST /api/plans/:planId/questions as multipart/form-data with a `text` field
 * and up to `photoLimits.maxCount` files in `photos`.
 */
export const photoLimits = {
  maxCount: 6,
  maxBytes: 15 * 1024 * 1024,
  /** Larger than this many pixels is refused before decoding (decompression bombs). */
  maxPixels: 50_000_000,
  acceptedTypes: ["image/jpeg", "image/png", "image/webp", "image/heic", "image/heif"],
} as const;

export const questionTextSchema = z.object({
  text: z.string().trim().min(1, "Write your question").max(2000, "Keep it under 2,000 characters"),
});

export const photoRefSchema = z.object({
  id: z.number().int(),
  /** Served only to the owning customer and staff; never a public static path. */
  url: z.string(),
  thumbUrl: z.string(),
  width: z.number().int(),
  height: z.number().int(),
});
export type PhotoRef = z.infer<typeof photoRefSchema>;

export const messageSchema = z.object({
  id: z.number().int(),
  kind: z.enum(["question", "answer", "check_in_request", "note"]),
  authorRole: z.enum(["customer", "technician", "manager", "system"]),
  authorName: z.string(),
  text: z.string(),
  photos: z.array(photoRefSchema),
  createdAt: z.string(),
  /** For the reader: true when this message arrived after they last read the thread. */
  unread: z.boolean(),
});
export type ThreadMessage = z.infer<typeof messageSchema>;

export const threadResponseSchema = z.object({
  planId: z.number().int(),
  messages: z.array(messageSchema),
});
export type ThreadResponse = z.infer<typeof threadResponseSchema>;

export const questionCreatedSchema = z.object({ message: messageSchema });
