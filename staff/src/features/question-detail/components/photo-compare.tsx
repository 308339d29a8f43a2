import { useState } from "react";
import { formatDay, type OpenPhoto } from "../lib/photo-viewing.ts";
import type { DatedPhoto } from "../lib/thread-parts.ts";
import { PhotoButton } from "./photo-button.tsx";

export interface PhotoCompareProps {
  /** The photos with the question being answered. */
  current: DatedPhoto[];
  /** The homeowner's earlier photos of the same lawn, newest first. */
  earlier: DatedPhoto[];
  onOpenPhoto: OpenPhoto;
}

/**
 * Now and then, side by side (even on a phone): has the seed come up since the last
 * check-in photo, or gone backwards? Any earlier photo can be picked for the right side.
 */
export function PhotoCompare({ current, earlier, onOpenPhoto }: PhotoCompareProps) {
  const [pickedId, setPickedId] = useState<number | null>(null);
  const then = earlier.find((p) => p.photo.id === pickedId) ?? earlier[0];
  const now = current[0];

  return (
    <section aria-labelledby="compare-heading" className="rounded-xl border border-line bg-surface p-4 sm:p-5">
      <h2 id="compare-heading" className="text-2xl text-pine-900">
        Earlier photos of this lawn
      </h2>
      {earlier.length === 0 ? (
        <p className="mt-2 text-ink-soft">No earlier check-in photos of this lawn yet, so there is nothing to compare with.</p>
      ) : (
        <>
          <div className="mt-3 grid grid-cols-2 gap-3">
            <Side label="Now" item={now} onOpenPhoto={onOpenPhoto} />
            <Side label="Earlier" item={then} onOpenPhoto={onOpenPhoto} />
          </div>
          {earlier.length > 1 && (
            <div className="mt-4">
              <p id="compare-pick" className="font-semibold">
                Compare with
              </p>
              <ul aria-labelledby="compare-pick" className="mt-1 flex gap-2 overflow-x-auto pb-2">
                {earlier.map((item) => (
                  <li key={item.photo.id} className="shrink-0">
                    <button
                      type="button"
                      aria-pressed={item.photo.id === then?.photo.id}
                      onClick={() => setPickedId(item.photo.id)}
                      className="block min-h-11 rounded-lg border-4 border-transparent aria-pressed:border-pine-700"
                    >
                      <img src={item.photo.thumbUrl} alt={`Photo of ${formatDay(item.takenAt)}`} className="h-16 w-20 rounded object-cover" />
                    </button>
                  </li>
                ))}
              </ul>
            </div>
          )}
        </>
      )}
    </section>
  );
}

function Side({ label, item, onOpenPhoto }: { label: string; item: DatedPhoto | undefined; onOpenPhoto: OpenPhoto }) {
  if (!item) {
    return (
      <figure className="flex flex-col gap-1">
        <figcaption className="font-semibold">
          {label} <span className="block font-normal text-ink-soft">—</span>
        </figcaption>
        <div className="flex aspect-[4/3] items-center justify-center rounded-lg border-2 border-dashed border-line p-2 text-center text-ink-soft">No photo with this question</div>
      </figure>
    );
  }
  const day = formatDay(item.takenAt);
  const alt = `${label}: the lawn on ${day}`;
  return (
    <figure className="flex min-w-0 flex-col gap-1">
      <figcaption className="font-semibold">
        {label} <span className="block font-normal text-ink-soft">{day}</span>
      </figcaption>
      <PhotoButton photo={item.photo} alt={alt} onOpen={() => onOpenPhoto({ photo: item.photo, alt, caption: `${label}: ${day}` })} />
    </figure>
  );
}
