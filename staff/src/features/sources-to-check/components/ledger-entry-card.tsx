import type { LedgerEntry } from "#shared/engine/tables/ledger";
import { entryLabel, valuesText } from "../lib/labels.ts";

/** One recalled value: what it is, the numbers the engine uses, where it was recalled from. */
export function LedgerEntryCard({ entry }: { entry: LedgerEntry }) {
  return (
    <li className="rounded-xl border border-line bg-surface p-4">
      <h3 className="text-lg font-semibold text-pine-900">{entryLabel(entry)}</h3>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-base">
        <dt className="font-semibold">Value</dt>
        <dd className="tabular-nums">{valuesText(entry.values)}</dd>
        <dt className="font-semibold">Recalled from</dt>
        <dd className="min-w-0 break-words">{entry.source}</dd>
        <dt className="font-semibold">In the engine</dt>
        <dd className="min-w-0 font-mono text-sm break-all text-ink-soft">{entry.path}</dd>
      </dl>
    </li>
  );
}
