import type { ButtonHTMLAttributes, Ref } from "react";

export type ButtonVariant = "primary" | "secondary" | "quiet" | "danger";

const base =
  "inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-5 py-2 text-base font-semibold " +
  "no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-60";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-pine-700 text-white hover:bg-pine-800 active:bg-pine-900",
  secondary: "border-2 border-pine-700 bg-surface text-pine-700 hover:bg-pine-50",
  quiet: "text-pine-700 underline underline-offset-4 hover:bg-pine-50",
  danger: "bg-rust-700 text-white hover:brightness-90",
};

/** The button look, for links that act as buttons (<a>, router <Link>). Tap target ≥ 44px. */
export function buttonClasses(variant: ButtonVariant = "primary", extra = ""): string {
  return `${base} ${variants[variant]} ${extra}`.trim();
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  /** Shows `pendingLabel` and blocks repeat presses while a request runs. */
  pending?: boolean;
  pendingLabel?: string;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({
  variant = "primary",
  pending = false,
  pendingLabel,
  type = "button",
  className = "",
  disabled,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...rest}
    >
      {pending && <Spinner />}
      {pending && pendingLabel ? pendingLabel : children}
    </button>
  );
}

export function Spinner({ className = "size-4" }: { className?: string }) {
  return (
    <span
      aria-hidden="true"
      className={`inline-block animate-spin rounded-full border-2 border-current border-r-transparent ${className}`}
    />
  );
}
