import type { z } from "zod";
import { apiErrorSchema } from "#shared/schemas/api-error";
import { ApiRequestError } from "./api-client.ts";

const networkMessage = "We couldn't reach Sproutline. Check your connection and try again.";

/**
 * Posts multipart/form-data (text fields and files) to our API and parses the answer.
 * apiFetch always sends JSON; endpoints that take photos accept multipart instead.
 * Errors come back as the same ApiRequestError, so forms place them the same way.
 */
export async function apiPostForm<T>(path: string, form: FormData, { schema, signal }: { schema: z.ZodType<T>; signal?: AbortSignal }): Promise<T> {
  let response: Response;
  try {
    // No Content-Type header: the browser writes the multipart boundary itself.
    response = await fetch(path, { method: "POST", credentials: "same-origin", signal, headers: { Accept: "application/json" }, body: form });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ApiRequestError(0, "network_error", networkMessage);
  }
  const json: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(json);
    if (parsed.success) {
      const { code, message, fields } = parsed.data.error;
      throw new ApiRequestError(response.status, code, message, fields);
    }
    throw new ApiRequestError(response.status, `http_${response.status}`, `The request failed (${response.status}).`);
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    console.error(`Unexpected response from POST ${path}`, parsed.error.issues);
    throw new ApiRequestError(response.status, "bad_response", "Sproutline sent an answer we didn't understand. Please try again.");
  }
  return parsed.data;
}
