import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import "./portal.css";
import { Providers } from "./app/providers.tsx";
import { i18nReady } from "./i18n/index.ts";

// Wait for the chosen language (Spanish is fetched on demand) so the first paint isn't in the wrong one.
void i18nReady.then(() => {
  createRoot(document.getElementById("root")!).render(
    <StrictMode>
      <Providers />
    </StrictMode>,
  );
});
