import "i18next";
import type en from "./en.json";

// English is the reference: a key missing there (or mistyped in code) fails the type check.
declare module "i18next" {
  interface CustomTypeOptions {
    defaultNS: "translation";
    resources: { translation: typeof en };
  }
}
