import type { ReactNode } from "react";

export type NoticeTone = "info" | "success" | "warning" | "danger";

const tones: Record<NoticeTone, string> = {
  info: "border-line bg-surface",
  success: "border-pine-700 bg-pine-100",
  warning: "border-straw-800 bg-straw-50 text-straw-800",
  danger: "border-rust-700 bg-rust-50 text-rust-700",
};

export interface NoticeProps {
  tone?: NoticeTone;
  title?: string;
  children?: ReactNode;
  className?: string;
}

/** A boxed message. Danger notices are announced at once (role=alert); others politely. */
export function Notice({ tone = "info", title, children, className = "" }: NoticeProps) {
  return (
    <div
      role={tone === "danger" ? "alert" : "status"}
      className={`rounded-lg border-l-4 p-4 ${tones[tone]} ${className}`}
    >
      {title && <p className="font-bold">{title}</p>}
      {children && <div className={title ? "mt-1" : ""}>{children}</div>}
    </div>
  );
}
