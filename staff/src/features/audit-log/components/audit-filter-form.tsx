import { useForm } from "react-hook-form";
import { Button, SelectField, TextField } from "#shared/ui/index";
import type { AuditFilter } from "../api/get-audit.ts";
import { subjectTypes } from "../lib/labels.ts";

/** Narrow the log to one kind of record, or one record by its number. Applied on "Show". */
export function AuditFilterForm({ filter, onChange }: { filter: AuditFilter; onChange: (filter: AuditFilter) => void }) {
  const { register, handleSubmit, reset } = useForm<Required<AuditFilter>>({
    defaultValues: { subjectType: filter.subjectType ?? "", subjectId: filter.subjectId ?? "" },
  });
  const apply = handleSubmit((values) => onChange({ subjectType: values.subjectType || undefined, subjectId: values.subjectId.trim() || undefined }));
  const filtered = Boolean(filter.subjectType || filter.subjectId);
  return (
    <form noValidate onSubmit={(e) => void apply(e)} className="grid gap-4 rounded-xl border border-line bg-surface p-4 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
      <SelectField label="Record type" options={subjectTypes} placeholderOption="Everything" {...register("subjectType")} />
      <TextField label="Record number" inputMode="numeric" maxLength={40} hint="E.g. the care plan's number from its address." {...register("subjectId")} />
      <div className="flex gap-2">
        <Button type="submit" variant="secondary">
          Show
        </Button>
        {filtered && (
          <Button
            variant="quiet"
            onClick={() => {
              reset({ subjectType: "", subjectId: "" });
              onChange({});
            }}
          >
            Clear
          </Button>
        )}
      </div>
    </form>
  );
}
