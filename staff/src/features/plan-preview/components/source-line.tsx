import type { Provenance } from "#shared/engine/index";
import { PROVENANCE_LABELS } from "../lib/labels.ts";

/** "Source: Nebraska Extension column (2021) — published source". */
export function SourceLine({ source, provenance, className = "" }: { source: string; provenance: Provenance; className?: string }) {
  return (
    <p className={`text-base text-ink-soft ${className}`}>
      <span className="font-semibold">Source:</span> {source} <span className="whitespace-nowrap">({PROVENANCE_LABELS[provenance]})</span>
    </p>
  );
}
