import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { isValidIsoDate } from "#shared/engine/index";
import { Button, TextField } from "#shared/ui/index";
import { lastSeason, lastTwelveMonths, thisSeason, type DateRange } from "../lib/range.ts";

const rangeSchema = z
  .object({
    from: z.string().refine(isValidIsoDate, "Pick a start date"),
    to: z.string().refine(isValidIsoDate, "Pick an end date"),
  })
  .refine((r) => r.from <= r.to, { message: "The start must be on or before the end", path: ["from"] });

const presets = [
  { label: "This season", range: thisSeason },
  { label: "Last season", range: lastSeason },
  { label: "Last 12 months", range: lastTwelveMonths },
] as const;

/** Quick ranges as buttons, any other range with two dates. Keyed by the range so the fields follow a preset. */
export function RangeForm({ range, onChange }: { range: DateRange; onChange: (range: DateRange) => void }) {
  return (
    <section aria-labelledby="report-range-heading" className="rounded-xl border border-line bg-surface p-4">
      <h2 id="report-range-heading" className="mb-3 text-xl text-pine-900">
        Seeding visits between
      </h2>
      <div className="mb-4 flex flex-wrap gap-2">
        {presets.map((preset) => {
          const presetRange = preset.range();
          const current = presetRange.from === range.from && presetRange.to === range.to;
          return (
            <Button key={preset.label} variant={current ? "primary" : "secondary"} aria-pressed={current} onClick={() => onChange(presetRange)}>
              {preset.label}
            </Button>
          );
        })}
      </div>
      <CustomRange key={`${range.from}:${range.to}`} range={range} onChange={onChange} />
    </section>
  );
}

function CustomRange({ range, onChange }: { range: DateRange; onChange: (range: DateRange) => void }) {
  const { register, handleSubmit, formState } = useForm<DateRange>({ resolver: zodResolver(rangeSchema), defaultValues: range });
  return (
    <form noValidate onSubmit={(e) => void handleSubmit(onChange)(e)} className="flex flex-wrap items-end gap-3">
      <TextField label="From" type="date" className="min-w-40 flex-1" error={formState.errors.from?.message} {...register("from")} />
      <TextField label="To" type="date" className="min-w-40 flex-1" error={formState.errors.to?.message} {...register("to")} />
      <Button type="submit" variant="secondary">
        Show this range
      </Button>
    </form>
  );
}
