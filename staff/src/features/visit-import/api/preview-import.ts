import { useMutation } from "@tanstack/react-query";
import { IMPORT_FILE_FIELD, importPreviewResponseSchema } from "#shared/schemas/visit-import";
import { apiPostForm } from "#shared/ui/index";

export function previewImport(file: File) {
  const form = new FormData();
  form.append(IMPORT_FILE_FIELD, file);
  return apiPostForm("/api/visit-imports/preview", form, { schema: importPreviewResponseSchema });
}

/** Checks every row of the file without importing anything. */
export function usePreviewImport() {
  return useMutation({ mutationFn: previewImport });
}
