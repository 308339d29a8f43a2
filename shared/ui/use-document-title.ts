import { createContext, useContext, useEffect } from "react";

/** The app's name, appended to every page title ("Outbox · Sproutline Staff"). */
export const TitleSuffixContext = createContext("Sproutline");

/** Sets the tab title so each page can be told apart in history, tabs and screen readers. */
export function useDocumentTitle(title: string) {
  const suffix = useContext(TitleSuffixContext);
  useEffect(() => {
    document.title = title ? `${title} · ${suffix}` : suffix;
  }, [title, suffix]);
}
