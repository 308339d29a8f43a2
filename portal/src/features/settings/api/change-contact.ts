import { useMutation } from "@tanstack/react-query";
import type { z } from "zod";
import type { contactChangeSchema } from "#shared/schemas/preferences";
import { apiFetch } from "#shared/ui/index";

export type ContactChange = z.infer<typeof contactChangeSchema>;

/** 202: a confirmation link goes to the new address; nothing changes until it is opened. */
export function requestContactChange(change: ContactChange): Promise<void> {
  return apiFetch("/api/my/contact", { method: "POST", body: change });
}

export function useRequestContactChange() {
  return useMutation({ mutationFn: requestContactChange });
}
