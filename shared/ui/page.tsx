import type { ReactNode } from "react";
import { useDocumentTitle } from "./use-document-title.ts";

export interface PageProps {
  /** The tab title, without the app name (added by the shell). */
  title: string;
  /** The page's single h1; defaults to the title. */
  heading?: ReactNode;
  /** A line or two under the heading. */
  intro?: ReactNode;
  /** Buttons at the heading's right on wide screens, under it on phones. */
  actions?: ReactNode;
  /** "narrow" for forms and reading; "wide" for lists and tables. */
  width?: "narrow" | "wide";
  children?: ReactNode;
}

export function Page({ title, heading, intro, actions, width = "narrow", children }: PageProps) {
  useDocumentTitle(title);
  return (
    <div className={`mx-auto w-full ${width === "narrow" ? "max-w-xl" : "max-w-5xl"}`}>
      <header className="mb-6 flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <h1 className="text-3xl text-pine-900">{heading ?? title}</h1>
          {intro && <div className="mt-2 text-ink-soft">{intro}</div>}
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </header>
      {children}
    </div>
  );
}
