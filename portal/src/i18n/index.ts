import i18next from "i18next";
import { initReactI18next } from "react-i18next";
import en from "./en.json";
import { initialLanguage, rememberLanguage, type Language } from "./language.ts";

/** The portal's own i18next instance (the staff app is English-only and doesn't load this). */
export const i18n = i18next.createInstance();

let spanishLoading: Promise<void> | null = null;

/** Spanish is fetched only by those who use it, keeping it out of the first-load bundle. */
function loadSpanish(): Promise<void> {
  spanishLoading ??= import("./es.json").then((module) => {
    i18n.addResourceBundle("es", "translation", module.default, true, true);
  });
  return spanishLoading;
}

/** Switches the whole portal at once and remembers the choice on this device. */
export async function applyLanguage(language: Language): Promise<void> {
  if (language === "es") await loadSpanish();
  rememberLanguage(language);
  document.documentElement.lang = language;
  if (i18n.language !== language) await i18n.changeLanguage(language);
}

/** Resolves once the first language is ready, so the first paint is already in it. */
export const i18nReady: Promise<void> = i18n
  .use(initReactI18next)
  .init({
    lng: "en",
    fallbackLng: "en",
    resources: { en: { translation: en } },
    // React escapes text itself.
    interpolation: { escapeValue: false },
  })
  .then(() => applyLanguage(initialLanguage()))
  .catch((error: unknown) => console.error("Could not start translations", error));
