import { useId, type InputHTMLAttributes, type Ref } from "react";

export interface Choice<T extends string> {
  value: T;
  label: string;
  /** Language of the label when it differs from the page ("Español" on an English page). */
  lang?: string;
}

export interface ChoiceGroupProps<T extends string> {
  legend: string;
  choices: readonly Choice<T>[];
  /** Controlled use: the chosen value and a change handler. */
  value?: T;
  onChoose?: (value: T) => void;
  /** Or react-hook-form's register() spread. */
  inputProps?: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };
  hint?: string;
}

/** Radio buttons as large rows, easy to hit with a thumb. */
export function ChoiceGroup<T extends string>({ legend, choices, value, onChoose, inputProps, hint }: ChoiceGroupProps<T>) {
  const name = useId();
  const hintId = useId();
  return (
    <fieldset aria-describedby={hint ? hintId : undefined}>
      <legend className="font-semibold">{legend}</legend>
      {hint && (
        <p id={hintId} className="text-base text-ink-soft">
          {hint}
        </p>
      )}
      <div className="mt-2 grid gap-2 sm:grid-cols-2">
        {choices.map((choice) => (
          <label
            key={choice.value}
            lang={choice.lang}
            className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border-2 border-line-strong bg-surface px-3 has-checked:border-pine-700 has-checked:bg-pine-50"
          >
            <input
              type="radio"
              name={inputProps?.name ?? name}
              value={choice.value}
              className="size-5 shrink-0 accent-pine-700"
              {...(inputProps ?? { checked: value === choice.value, onChange: () => onChoose?.(choice.value) })}
            />
            <span className="font-semibold">{choice.label}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
