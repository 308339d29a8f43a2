import type { z } from "zod";
import { apiErrorSchema } from "#shared/schemas/api-error";

/** An API call that failed, in one shape the screens can show in place (DESIGN.md §3). */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;

  constructor(status: number, code: string, message: string, fields: Record<string, string> = {}) {
    super(message);
    this.name = "ApiRequestError";
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiRequestError(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError;
}

export type HttpMethod = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

export interface ApiFetchOptions {
  method?: HttpMethod;
  body?: unknown;
  signal?: AbortSignal;
}

const networkMessage = "We couldn't reach Sproutline. Check your connection and try again.";

/**
 * Calls our own API with the session cookie and returns the parsed body.
 * With a schema the response is validated (a mismatch is a bug, reported as `bad_response`);
 * without one the body is ignored, which suits 202/204 answers.
 */
export function apiFetch<T>(path: string, options: ApiFetchOptions & { schema: z.ZodType<T> }): Promise<T>;
export function apiFetch(path: string, options?: ApiFetchOptions): Promise<void>;
export async function apiFetch<T>(
  path: string,
  { method = "GET", body, signal, schema }: ApiFetchOptions & { schema?: z.ZodType<T> } = {},
): Promise<T | void> {
  const sendsBody = method !== "GET";
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: "same-origin",
      signal,
      headers: {
        Accept: "application/json",
        // Always JSON on writes (even "{}"), so the server can refuse form posts from other sites.
        ...(sendsBody ? { "Content-Type": "application/json" } : {}),
      },
      body: sendsBody ? JSON.stringify(body ?? {}) : undefined,
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ApiRequestError(0, "network_error", networkMessage);
  }

  if (!response.ok) throw await toApiRequestError(response);
  if (!schema) return;

  const json: unknown = await response.json().catch(() => undefined);
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    console.error(`Unexpected response from ${method} ${path}`, parsed.error.issues);
    throw new ApiRequestError(response.status, "bad_response", "Sproutline sent an answer we didn't understand. Please try again.");
  }
  return parsed.data;
}

async function toApiRequestError(response: Response): Promise<ApiRequestError> {
  const json: unknown = await response.json().catch(() => undefined);
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiRequestError(response.status, code, message, fields);
  }
  // Not our JSON shape: a proxy page, a crash, or an endpoint that doesn't exist here.
  const message =
    response.status >= 500
      ? "Something went wrong on our side. Please try again in a moment."
      : `The request failed (${response.status}).`;
  return new ApiRequestError(response.status, `http_${response.status}`, message);
}

/** A message for any error a query or mutation may throw, fit to show a person. */
export function errorMessage(error: unknown): string {
  if (isApiRequestError(error)) return error.message;
  return "Something unexpected went wrong. Please try again.";
}
