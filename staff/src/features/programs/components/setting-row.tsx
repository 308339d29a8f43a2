import { useId } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { Button } from "#shared/ui/index";
import type { Bound } from "../api/get-program.ts";
import { stepOf, unitLabel } from "../lib/setting-labels.ts";

export interface SettingRowProps {
  label: string;
  bound: Bound;
  registration: UseFormRegisterReturn;
  error?: string;
  /** Shown when the value differs from the version in force. */
  savedValue: string;
  changed: boolean;
  /** Puts a value that is out of bounds back to the nearest bound. */
  onClamp: (value: number) => void;
  typedValue: string;
}

/** One setting: its value and unit, the safe range, and why the range is what it is. */
export function SettingRow({ label, bound, registration, error, savedValue, changed, onClamp, typedValue }: SettingRowProps) {
  const id = useId();
  const unit = unitLabel(bound.unit);
  const typed = Number(typedValue);
  const clampTo = Number.isFinite(typed) && typedValue.trim() !== "" ? (typed < bound.min ? bound.min : typed > bound.max ? bound.max : null) : null;
  return (
    <li className={`grid gap-3 rounded-xl border bg-surface p-4 md:grid-cols-[minmax(0,1fr)_15rem] ${changed ? "border-pine-700" : "border-line"}`}>
      <div className="min-w-0">
        <label htmlFor={id} className="font-semibold">
          {label}
        </label>
        <p id={`${id}-why`} className="mt-1 text-ink-soft">
          {bound.why}
        </p>
        <p className="mt-1 text-base text-ink-soft">
          Source: {bound.source} · <span className="font-semibold">{bound.provenance}</span>
        </p>
      </div>
      <div className="flex flex-col gap-1">
        <div className="flex items-center gap-2">
          <input
            id={id}
            type="number"
            inputMode="decimal"
            min={bound.min}
            max={bound.max}
            step={stepOf(bound.unit, bound.integer)}
            aria-invalid={error ? true : undefined}
            aria-describedby={`${id}-range ${id}-why${error ? ` ${id}-error` : ""}`}
            className={`min-h-12 w-28 rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink ${error ? "border-rust-700" : "border-line-strong"}`}
            {...registration}
          />
          {unit && <span className="font-semibold">{unit}</span>}
        </div>
        <p id={`${id}-range`} className="text-base text-ink-soft">
          Safe range {bound.min}–{bound.max}
          {unit && ` ${unit}`} · default {bound.default}
        </p>
        {changed && !error && <p className="text-base text-pine-800">Changed from {savedValue}</p>}
        {error && (
          <p id={`${id}-error`} className="flex items-start gap-1 font-semibold text-rust-700">
            <span aria-hidden="true">⚠</span>
            {error}
          </p>
        )}
        {error && clampTo !== null && (
          <Button variant="quiet" className="self-start px-2" onClick={() => onClamp(clampTo)}>
            Use {clampTo}
            {unit && ` ${unit}`}
          </Button>
        )}
      </div>
    </li>
  );
}
