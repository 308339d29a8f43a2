import { useMutation, useQueryClient } from "@tanstack/react-query";
import { meResponseSchema, type CurrentUser, type SignInLinkConsume } from "#shared/schemas/auth";
import { apiFetch, meQueryKey } from "#shared/ui/index";

export async function consumeSignInLink(body: SignInLinkConsume): Promise<CurrentUser> {
  const { user } = await apiFetch("/api/auth/link/consume", { method: "POST", body, schema: meResponseSchema });
  return user;
}

/** Signs in with the link's token; the answer is the new "me", so no extra /api/me round trip. */
export function useConsumeSignInLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: consumeSignInLink,
    onSuccess: (user) => {
      // A different person may have been signed in on this device: drop their cached data.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, user);
    },
  });
}
