import { useMutation } from "@tanstack/react-query";
import type { SignInLinkRequest } from "#shared/schemas/auth";
import { apiFetch } from "#shared/ui/index";

/** 202 whether or not the contact is on file, so the answer reveals nothing about accounts. */
export function requestSignInLink(body: SignInLinkRequest): Promise<void> {
  return apiFetch("/api/auth/link", { method: "POST", body });
}

export function useRequestSignInLink() {
  return useMutation({ mutationFn: requestSignInLink });
}
