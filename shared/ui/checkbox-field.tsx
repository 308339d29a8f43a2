import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from "react";

export interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type" | "size"> {
  label: ReactNode;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A checkbox whose whole label row is the tap target (≥ 44 px), for react-hook-form's `register()`. */
export function CheckboxField({ label, hint, id, className = "", ref, ...input }: CheckboxFieldProps) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = hint ? `${inputId}-hint` : undefined;
  return (
    <div className={className}>
      <label htmlFor={inputId} className="flex min-h-11 cursor-pointer items-center gap-3 font-semibold">
        <input id={inputId} ref={ref} type="checkbox" aria-describedby={hintId} className="size-6 shrink-0 accent-pine-700" {...input} />
        <span>{label}</span>
      </label>
      {hint && (
        <p id={hintId} className="ml-9 text-base text-ink-soft">
          {hint}
        </p>
      )}
    </div>
  );
}
