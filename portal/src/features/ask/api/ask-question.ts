import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiErrorSchema } from "#shared/schemas/api-error";
import { questionCreatedSchema, type ThreadMessage } from "#shared/schemas/questions";
import { ApiRequestError } from "#shared/ui/index";
import { portalKeys } from "../../../common/api/query-keys.ts";
import { isNetworkError } from "../../../common/lib/use-error-text.ts";

export interface QuestionUpload {
  text: string;
  photos: File[];
}

/** Fraction sent, 0–1; called as bytes leave the phone. */
export type ProgressListener = (fraction: number) => void;

function toError(status: number, body: string): ApiRequestError {
  let json: unknown;
  try {
    json = JSON.parse(body);
  } catch {
    json = undefined;
  }
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiRequestError(status, code, message, fields);
  }
  return new ApiRequestError(status, `http_${status}`, `The request failed (${status}).`);
}

/**
 * Multipart upload through XMLHttpRequest, because fetch() can't report upload progress yet,
 * and a progress bar is what keeps someone from giving up on a slow connection.
 */
export function postQuestion(planId: number, { text, photos }: QuestionUpload, onProgress: ProgressListener): Promise<ThreadMessage> {
  const form = new FormData();
  form.append("text", text);
  for (const photo of photos) form.append("photos", photo, photo.name);

  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/plans/${planId}/questions`);
    xhr.setRequestHeader("Accept", "application/json");
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      if (xhr.status < 200 || xhr.status >= 300) {
        reject(toError(xhr.status, xhr.responseText));
        return;
      }
      let json: unknown;
      try {
        json = JSON.parse(xhr.responseText);
      } catch {
        json = undefined;
      }
      const parsed = questionCreatedSchema.safeParse(json);
      if (parsed.success) resolve(parsed.data.message);
      else reject(new ApiRequestError(xhr.status, "bad_response", "Sproutline sent an answer we didn't understand. Please try again."));
    };
    const dropped = () => reject(new ApiRequestError(0, "network_error", "We couldn't reach Sproutline. Check your connection and try again."));
    xhr.onerror = dropped;
    xhr.ontimeout = dropped;
    xhr.onabort = dropped;
    xhr.send(form);
  });
}

const maxAutomaticRetries = 3;

/**
 * Sends a question; a dropped connection is retried by itself a few times, waiting longer
 * each time (1 s, 2 s, 4 s). Refusals (wrong type, too large) are not retried: they won't change.
 * The form keeps its text and photos whatever happens, so a failure never costs typing.
 */
export function useAskQuestion(planId: number, onProgress: ProgressListener) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: QuestionUpload) => {
      onProgress(0);
      return postQuestion(planId, upload, onProgress);
    },
    retry: (failureCount, error) => isNetworkError(error) && failureCount < maxAutomaticRetries,
    retryDelay: (failures) => Math.min(1000 * 2 ** (failures - 1), 8000),
    // Uploading needs the connection; sending while offline would only burn the retries.
    networkMode: "online",
    onSuccess: () => queryClient.invalidateQueries({ queryKey: portalKeys.thread(planId) }),
  });
}

export { maxAutomaticRetries };
