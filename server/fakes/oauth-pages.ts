import { escapeHtml, renderPage } from "./html-page.ts";
import type { OAuthAccount } from "./oauth-identity.ts";

const BANNER = "Local test sign-in page for development and tests. No real account or password is used.";

/** The authorisation request, carried through the page in hidden fields. */
export interface AuthorizationRequest {
  clientId: string;
  redirectUri: string;
  responseType: string;
  scope: string;
  state: string;
  nonce: string;
}

function hiddenFields(request: AuthorizationRequest): string {
  const fields: Record<string, string> = {
    client_id: request.clientId,
    redirect_uri: request.redirectUri,
    response_type: request.responseType,
    scope: request.scope,
    state: request.state,
    nonce: request.nonce,
  };
  return Object.entries(fields)
    .map(([name, value]) => `<input type="hidden" name="${name}" value="${escapeHtml(value)}">`)
    .join("\n  ");
}

export function renderAccountChooser(request: AuthorizationRequest, accounts: OAuthAccount[], formAction: string): string {
  const returnTo = new URL(request.redirectUri).origin;
  const accountButtons = accounts.length
    ? accounts
        .map(
          (a) =>
            `<button class="account" type="submit" name="email" value="${escapeHtml(a.email)}">${escapeHtml(a.name)}<span>${escapeHtml(a.email)}</span></button>`,
        )
        .join("\n  ")
    : "<p>No demo accounts are configured. Use the form below.</p>";
  return renderPage(
    "Choose an account — local test sign-in",
    BANNER,
    `<h1>Choose an account</h1>
<p>You will go back to <strong>${escapeHtml(returnTo)}</strong> signed in as the account you pick.</p>
<h2 id="demo-heading">Demo accounts</h2>
<form method="post" action="${escapeHtml(formAction)}" aria-labelledby="demo-heading">
  ${hiddenFields(request)}
  ${accountButtons}
</form>
<h2 id="other-heading">Another e-mail address</h2>
<form method="post" action="${escapeHtml(formAction)}" aria-labelledby="other-heading">
  ${hiddenFields(request)}
  <label for="other-email">E-mail address</label>
  <input id="other-email" name="email" type="email" required autocomplete="email" inputmode="email">
  <label for="other-name">Name (optional)</label>
  <input id="other-name" name="name" type="text" autocomplete="name">
  <label class="check"><input type="checkbox" name="unverified" value="1"> Report this address as not verified</label>
  <p><button class="primary" type="submit">Sign in with this address</button></p>
</form>
<form method="post" action="${escapeHtml(formAction)}">
  ${hiddenFields(request)}
  <input type="hidden" name="cancel" value="1">
  <p><button class="secondary" type="submit">Cancel and go back</button></p>
</form>`,
  );
}

/** Shown instead of redirecting when the client or redirect URI cannot be trusted. */
export function renderAuthorizationError(error: string, description: string): string {
  return renderPage(
    "Sign-in request refused — local test sign-in",
    BANNER,
    `<h1>This sign-in request was refused</h1>
<p class="error" role="alert"><strong>${escapeHtml(error)}</strong>: ${escapeHtml(description)}</p>`,
  );
}
