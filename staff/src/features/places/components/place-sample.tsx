import { useMemo, useState } from "react";
import type { SavePlace } from "#shared/schemas/place-rules";
import { ErrorState, LoadingState, SelectField, Spinner, TextField, formatCalendarDay, useDebouncedValue } from "#shared/ui/index";
import { usePlaceSample } from "../api/preview-place-sample.ts";
import { compareSample, type SampleComparison } from "../lib/compare.ts";
import { defaultSampleDate, sampleInput, sampleJobDescriptions, sampleJobOptions, type SampleJob } from "../lib/sample-jobs.ts";

/** Long enough to skip keystrokes, short enough to feel live. */
const PREVIEW_DELAY_MS = 300;

/**
 * A sample job planned with and without the place's rules, and what the rules changed. While the
 * rules have errors the last valid ones stay, so the sample doesn't blank out.
 */
export function PlaceSample({ place }: { place: SavePlace | null }) {
  const [job, setJob] = useState<SampleJob>("seeding");
  const [date, setDate] = useState(defaultSampleDate);
  const validDate = /^\d{4}-\d{2}-\d{2}$/.test(date);
  const debounced = useDebouncedValue(place ? JSON.stringify(place) : null, PREVIEW_DELAY_MS);
  const [lastGood, setLastGood] = useState<string | null>(null);
  if (debounced !== null && debounced !== lastGood) setLastGood(debounced);
  const rules = lastGood ? (JSON.parse(lastGood) as SavePlace) : null;

  const withoutInput = useMemo(() => (validDate ? sampleInput(job, date, null) : null), [job, date, validDate]);
  const withInput = useMemo(() => (validDate && rules ? sampleInput(job, date, rules) : null), [job, date, validDate, rules]);
  const without = usePlaceSample(withoutInput);
  const withRules = usePlaceSample(withInput);
  const comparison = without.data && withRules.data ? compareSample(without.data, withRules.data) : null;
  const failed = without.isError ? without : withRules.isError ? withRules : null;

  return (
    <section aria-labelledby="place-sample-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="place-sample-heading" className="text-2xl text-pine-900">
          Sample plan
        </h2>
        <span role="status" className="inline-flex min-h-6 items-center gap-2 text-ink-soft">
          {withRules.isFetching && withRules.data !== undefined && (
            <>
              <Spinner /> Updating…
            </>
          )}
        </span>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="Sample job" options={sampleJobOptions} value={job} onChange={(e) => setJob(e.target.value as SampleJob)} />
        <TextField label="Visit date" type="date" value={date} onChange={(e) => setDate(e.target.value)} error={validDate ? undefined : "Pick a date"} />
      </div>
      <p className="text-ink-soft">{sampleJobDescriptions[job]}</p>
      {!rules && <p className="text-ink-soft">Fill in the place's rules to see what they change.</p>}
      {place === null && rules && <p className="font-semibold text-rust-700">Fix the marked rules to update the sample.</p>}
      {failed && <ErrorState title="The sample plan didn't load" error={failed.error} onRetry={() => void failed.refetch()} retrying={failed.isFetching} />}
      {!failed && rules && validDate && (without.isPending || withRules.isPending) && <LoadingState label="Working out the sample plan…" />}
      {comparison && <Comparison comparison={comparison} />}
    </section>
  );
}

function Comparison({ comparison }: { comparison: SampleComparison }) {
  const { feeds, waterings, warnings } = comparison;
  return (
    <div className="flex flex-col gap-4 rounded-xl border border-line bg-surface p-4">
      <div>
        <h3 className="text-lg">Feedings</h3>
        {feeds.length === 0 ? (
          <p className="text-ink-soft">The plan schedules no feeding for this job.</p>
        ) : (
          <ul className="flex flex-col gap-1">
            {feeds.map((f) => (
              <li key={f.key}>
                <span className="font-semibold">{f.title}:</span>{" "}
                {f.after === null
                  ? `${formatCalendarDay(f.before)} → left out (the homeowner gets a note why)`
                  : f.after === f.before
                    ? `${formatCalendarDay(f.before)}, unchanged`
                    : `${formatCalendarDay(f.before)} → ${formatCalendarDay(f.after)}`}
              </li>
            ))}
          </ul>
        )}
      </div>
      <div>
        <h3 className="text-lg">Waterings</h3>
        <p>
          {waterings.moved === 0 && waterings.before === waterings.after
            ? `${waterings.after} watering days, unchanged.`
            : `${waterings.after} watering days${waterings.after === waterings.before ? "" : ` instead of ${waterings.before}`}; ${waterings.moved} moved to an allowed day.`}
        </p>
      </div>
      <div>
        <h3 className="text-lg">Warnings from these rules</h3>
        {warnings.length === 0 ? (
          <p className="text-ink-soft">None for this job.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {warnings.map((w) => (
              <li key={`${w.code}-${w.audience}`} className="rounded-lg border-l-4 border-straw-800 bg-straw-50 p-3">
                <span className="font-semibold">{w.audience === "crew" ? "Crew: " : "Homeowner reads: "}</span>
                {w.message}
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
