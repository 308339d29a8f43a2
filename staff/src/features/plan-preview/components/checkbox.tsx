import type { InputHTMLAttributes, Ref } from "react";

export interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "type"> {
  label: string;
  ref?: Ref<HTMLInputElement>;
}

/** A checkbox whose whole label is the tap target (at least 44 px high). */
export function Checkbox({ label, ref, className = "", ...input }: CheckboxProps) {
  return (
    <label className={`flex min-h-11 cursor-pointer items-center gap-3 ${className}`}>
      <input ref={ref} type="checkbox" className="size-5 shrink-0 accent-pine-700" {...input} />
      <span>{label}</span>
    </label>
  );
}
