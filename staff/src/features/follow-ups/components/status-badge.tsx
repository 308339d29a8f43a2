import type { FollowUpStatus } from "#shared/schemas/follow-ups";
import { statusLabels } from "../lib/labels.ts";

const tones: Record<FollowUpStatus, string> = {
  requested: "bg-straw-50 text-straw-800 border-straw-800",
  scheduled: "bg-pine-50 text-pine-800 border-pine-700",
  done: "bg-pine-100 text-pine-900 border-pine-900",
  closed: "bg-canvas text-ink-soft border-line-strong",
};

export function StatusBadge({ status }: { status: FollowUpStatus }) {
  return <span className={`inline-block rounded-full border px-2.5 py-0.5 text-sm font-semibold whitespace-nowrap ${tones[status]}`}>{statusLabels[status]}</span>;
}

export function CallbackBadge() {
  return <span className="inline-block rounded-full border border-rust-700 bg-rust-50 px-2.5 py-0.5 text-sm font-semibold text-rust-700">Callback</span>;
}
