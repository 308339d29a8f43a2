import { useFormContext, type Path } from "react-hook-form";
import { TextField, type TextFieldProps } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { fieldId, type VisitFormValues } from "../lib/form-values.ts";

export interface VisitTextFieldProps extends Omit<TextFieldProps, "name" | "error" | "id"> {
  path: Path<VisitFormValues>;
  numeric?: boolean;
}

/** A TextField bound to a form path, with that path's message and a stable id to jump to. */
export function VisitTextField({ path, numeric = false, ...props }: VisitTextFieldProps) {
  const { register } = useFormContext<VisitFormValues>();
  return (
    <TextField
      id={fieldId(path)}
      error={useFieldError(path)}
      autoComplete="off"
      {...(numeric ? { inputMode: "decimal" as const } : {})}
      {...props}
      {...register(path)}
    />
  );
}
