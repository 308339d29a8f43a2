import { createContext, use } from "react";
import type { FormFieldErrors } from "./to-log-visit.ts";

/** The form's current messages by path ("visit.areaFt2"), from our checks and the server's. */
export const VisitErrorsContext = createContext<FormFieldErrors>({});

export function useFieldError(path: string): string | undefined {
  return use(VisitErrorsContext)[path];
}
