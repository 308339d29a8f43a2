import { roleLabel } from "#shared/ui/index";
import type { Role } from "#shared/schemas/auth";
import type { AuditEntry } from "../api/get-audit.ts";
import { formatWhen, subjectName } from "../lib/labels.ts";

/** One line per read or change, as a sentence: who did what for whom; when, the record and where from beneath. */
export function AuditEntries({ entries }: { entries: AuditEntry[] }) {
  return (
    <ol className="flex flex-col divide-y divide-line rounded-xl border border-line bg-surface">
      {entries.map((entry) => (
        <li key={entry.id} className="flex flex-col gap-1 p-3">
          <p className="font-semibold">{entry.sentence}</p>
          <p className="flex flex-wrap gap-x-3 text-sm text-ink-soft">
            <time dateTime={entry.at}>{formatWhen(entry.at)}</time>
            {entry.actorRole && <span>{roleLabel(entry.actorRole as Role)}</span>}
            {entry.subjectType && (
              <span>
                {subjectName(entry.subjectType)}
                {entry.subjectId && ` #${entry.subjectId}`}
              </span>
            )}
            {entry.ip && <span>from {entry.ip}</span>}
          </p>
        </li>
      ))}
    </ol>
  );
}
