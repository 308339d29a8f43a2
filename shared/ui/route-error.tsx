import { Link, isRouteErrorResponse, useRouteError } from "react-router-dom";
import { AppShell } from "./app-shell.tsx";
import { buttonClasses } from "./button.tsx";
import { Page } from "./page.tsx";

/** Shown for any path the app doesn't have. */
export function NotFoundPage({ homeTo = "/", homeLabel = "Go to the start page" }: { homeTo?: string; homeLabel?: string }) {
  return (
    <Page title="Page not found" intro="The address may be mistyped, or the page has moved.">
      <Link to={homeTo} className={buttonClasses("primary")}>
        {homeLabel}
      </Link>
    </Page>
  );
}

/** The router's errorElement: a crash in a screen shows this instead of a blank page. */
export function RouteErrorPage({ productLabel }: { productLabel: string }) {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  if (!notFound) console.error(error);
  return (
    <AppShell productLabel={productLabel}>
      {notFound ? (
        <NotFoundPage />
      ) : (
        <Page title="Something went wrong" intro="This page hit a problem. Reloading usually fixes it.">
          <button type="button" className={buttonClasses("primary")} onClick={() => window.location.reload()}>
            Reload the page
          </button>
        </Page>
      )}
    </AppShell>
  );
}
