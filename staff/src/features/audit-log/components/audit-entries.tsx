import { roleLabel } from "#shared/ui/index";
import type { Role } from "#shared/schemas/auth";
import type { AuditEntry } from "../api/get-audit.ts";
import { actionLabel, formatWhen, subjectName } from "../lib/labels.ts";

/** One line per read or change: who, what, which record, when, from where. */
export function AuditEntries({ entries }: { entries: AuditEntry[] }) {
  return (
    <ol className="flex flex-col divide-y divide-line rounded-xl border border-line bg-surface">
      {entries.map((entry) => (
        <li key={entry.id} className="grid gap-1 p-3 md:grid-cols-[12rem_minmax(0,1fr)_minmax(0,1fr)] md:gap-4">
          <time dateTime={entry.at} className="text-ink-soft">
            {formatWhen(entry.at)}
          </time>
          <div className="min-w-0">
            <p className="font-semibold">{actionLabel(entry.action)}</p>
            {entry.subjectType && (
              <p className="text-ink-soft">
                {subjectName(entry.subjectType)}
                {entry.subjectId && ` #${entry.subjectId}`}
              </p>
            )}
          </div>
          <div className="min-w-0">
            <p>
              {entry.actorName ?? "Someone no longer on file"}
              {entry.actorRole && <span className="text-ink-soft"> · {roleLabel(entry.actorRole as Role)}</span>}
            </p>
            <p className="truncate font-mono text-sm text-ink-soft" title={entry.path ?? undefined}>
              {[entry.method, entry.path].filter(Boolean).join(" ")}
              {entry.ip && ` · ${entry.ip}`}
            </p>
          </div>
        </li>
      ))}
    </ol>
  );
}
