import { useMutation, useQueryClient } from "@tanstack/react-query";
import { publicCompanyResponseSchema } from "#shared/schemas/company";
import { apiPostForm } from "#shared/ui/index";
import { companyProfileKey } from "./get-company-profile.ts";

export async function uploadLogo(file: File) {
  const form = new FormData();
  form.append("logo", file, file.name);
  const { company } = await apiPostForm("/api/company/logo", form, { schema: publicCompanyResponseSchema });
  return company;
}

/** Replaces the company's logo; the server checks and re-encodes it, then answers with the new address. */
export function useUploadLogo() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadLogo, onSuccess: (company) => queryClient.setQueryData(companyProfileKey, company) });
}
