import type { MouseEvent } from "react";
import type { FieldErrors } from "#shared/engine/index";
import { fieldId } from "../lib/field-errors.ts";
import { describeFieldPath } from "../lib/labels.ts";

/**
 * Tells why the plan stopped following the form, with a link to each field that
 * needs fixing (the field may be far down a long form on a phone).
 */
export function ErrorSummary({ fields }: { fields: FieldErrors }) {
  const entries = Object.entries(fields);
  return (
    <div role="status" className="rounded-lg border-l-4 border-straw-800 bg-straw-50 p-4 text-straw-800">
      <p className="font-bold">
        {entries.length === 1 ? "One field needs fixing" : `${entries.length} fields need fixing`} before the plan can update
      </p>
      <p className="mt-1">The plan shown is for the last inputs that worked.</p>
      <ul className="mt-2 list-disc pl-5">
        {entries.map(([path, message]) => (
          <li key={path}>
            <a href={`#${fieldId(path)}`} className="text-straw-800" onClick={(event) => focusField(event, path)}>
              {describeFieldPath(path)}: {message}
            </a>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** Moves focus to the field itself (not only the scroll position), so typing can start at once. */
function focusField(event: MouseEvent<HTMLAnchorElement>, path: string) {
  const target = document.getElementById(fieldId(path));
  if (!target) return;
  event.preventDefault();
  target.scrollIntoView({ block: "center" });
  target.focus({ preventScroll: true });
}
