import { useId, type ReactNode } from "react";

/** A titled part of a page (h2), labelled for screen-reader landmark lists. */
export function Section({ title, children, className = "" }: { title: string; children: ReactNode; className?: string }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={`mt-8 first:mt-0 ${className}`}>
      <h2 id={id} className="mb-3 text-2xl text-pine-900">
        {title}
      </h2>
      {children}
    </section>
  );
}
