import { useMutation, useQueryClient } from "@tanstack/react-query";
import { publicCompanyResponseSchema, type CompanyProfileUpdate } from "#shared/schemas/company";
import { apiFetch } from "#shared/ui/index";
import { companyProfileKey } from "./get-company-profile.ts";

export async function updateCompanyProfile(body: CompanyProfileUpdate) {
  const { company } = await apiFetch("/api/company", { method: "PATCH", body, schema: publicCompanyResponseSchema });
  return company;
}

/** Saves the office number homeowners tap to call or text; an empty one removes it from the portal. */
export function useUpdateCompanyProfile() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateCompanyProfile, onSuccess: (company) => queryClient.setQueryData(companyProfileKey, company) });
}
