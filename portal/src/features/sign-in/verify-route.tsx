import { useEffect, useRef } from "react";
import { Navigate, useSearchParams } from "react-router-dom";
import { signInLinkConsumeSchema } from "#shared/schemas/auth";
import { ErrorState, LoadingState, Page, isApiRequestError } from "#shared/ui/index";
import { useConsumeSignInLink } from "./api/consume-link.ts";
import { LinkProblem } from "./components/link-problem.tsx";

// invalid_input: the server's schema refused the token, which to a person is a broken link.
const linkProblemCodes = new Set(["link_invalid", "link_expired", "link_used", "invalid_input"]);

/** Landing page of the e-mailed/texted link: signs in once, then opens the care plan. */
export function VerifyRoute() {
  const [searchParams] = useSearchParams();
  const parsed = signInLinkConsumeSchema.safeParse({ token: searchParams.get("token") ?? "" });
  const consume = useConsumeSignInLink();
  const started = useRef(false);

  // A link works once: the ref keeps StrictMode's second effect run from sending it again.
  useEffect(() => {
    if (started.current || !parsed.success) return;
    started.current = true;
    consume.mutate(parsed.data);
  }, [parsed.success, parsed.data, consume]);

  if (consume.isSuccess) return <Navigate to="/" replace />;

  const failed = !parsed.success || consume.isError;
  let body;
  if (!parsed.success) {
    body = <LinkProblem code="link_invalid" />;
  } else if (consume.isError) {
    const error = consume.error;
    body =
      isApiRequestError(error) && linkProblemCodes.has(error.code) ? (
        <LinkProblem code={error.code} />
      ) : (
        <ErrorState title="Something got in the way" error={error} onRetry={() => consume.mutate(parsed.data)} retrying={consume.isPending} />
      );
  } else {
    body = <LoadingState label="Signing you in…" />;
  }

  return (
    <Page title={failed ? "Sign-in link problem" : "Signing in"} heading={failed ? "We couldn't sign you in" : "Signing you in"}>
      {body}
    </Page>
  );
}
