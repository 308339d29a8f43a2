import { useMutation, useQueryClient } from "@tanstack/react-query";
import { IMPORT_FILE_FIELD, importResultSchema } from "#shared/schemas/visit-import";
import { apiPostForm } from "#shared/ui/index";

export function runImport(file: File) {
  const form = new FormData();
  form.append(IMPORT_FILE_FIELD, file);
  return apiPostForm("/api/visit-imports", form, { schema: importResultSchema });
}

/** Imports the file; the request lasts until every row is done (about a minute for 2,000 rows). */
export function useRunImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: runImport,
    // New customers, visits and plans: lists elsewhere in the app are out of date now.
    onSuccess: () => queryClient.invalidateQueries({ predicate: (query) => query.queryKey[0] !== "session" }),
  });
}
