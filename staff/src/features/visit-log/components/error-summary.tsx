import type { MouseEvent } from "react";
import { fieldId } from "../lib/form-values.ts";
import { describeField } from "../lib/field-labels.ts";

/** What stops the save, with a link to each field (far up a long form on a phone). */
export function ErrorSummary({ fields }: { fields: Record<string, string> }) {
  const entries = Object.entries(fields);
  if (entries.length === 0) return null;
  return (
    <div role="alert" className="rounded-lg border-l-4 border-rust-700 bg-rust-50 p-4 text-rust-700">
      <p className="font-bold">{entries.length === 1 ? "One thing to fix before saving" : `${entries.length} things to fix before saving`}</p>
      <ul className="mt-2 list-disc pl-5">
        {entries.map(([path, message]) => (
          <li key={path}>
            <a href={`#${fieldId(path)}`} className="text-rust-700" onClick={(event) => focusField(event, path)}>
              {describeField(path)}: {message}
            </a>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** Moves focus to the field itself, not only the scroll position, so typing can start at once. */
function focusField(event: MouseEvent<HTMLAnchorElement>, path: string) {
  const target = document.getElementById(fieldId(path));
  if (!target) return;
  event.preventDefault();
  target.scrollIntoView({ block: "center" });
  target.focus({ preventScroll: true });
}
