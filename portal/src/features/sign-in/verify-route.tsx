import { useEffect, useRef } from "react";
import { useTranslation } from "react-i18next";
import { Navigate, useSearchParams } from "react-router-dom";
import { signInLinkConsumeSchema } from "#shared/schemas/auth";
import { portalRouterPath, safePortalNext } from "#shared/schemas/next-path";
import { ErrorState, LoadingState, Page, isApiRequestError } from "#shared/ui/index";
import { useConsumeSignInLink } from "./api/consume-link.ts";
import { useErrorText } from "../../common/lib/use-error-text.ts";
import { LinkProblem } from "./components/link-problem.tsx";

// invalid_input: the server's schema refused the token, which to a person is a broken link.
const linkProblemCodes = new Set(["link_invalid", "link_expired", "link_used", "invalid_input"]);

/** Landing page of the e-mailed/texted link: signs in once, then opens the page the link was for (else the care plan). */
export function VerifyRoute() {
  const { t } = useTranslation();
  const [searchParams] = useSearchParams();
  const parsed = signInLinkConsumeSchema.safeParse({ token: searchParams.get("token") ?? "" });
  const consume = useConsumeSignInLink();
  const errorText = useErrorText();
  const started = useRef(false);

  // A link works once: the ref keeps StrictMode's second effect run from sending it again.
  useEffect(() => {
    if (started.current || !parsed.success) return;
    started.current = true;
    consume.mutate(parsed.data);
  }, [parsed.success, parsed.data, consume]);

  if (consume.isSuccess) {
    const next = safePortalNext(searchParams.get("next"));
    return <Navigate to={next ? portalRouterPath(next) : "/"} replace />;
  }

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
        <ErrorState
          title={t("signIn.problemOther")}
          error={error}
          message={errorText(error)}
          onRetry={() => consume.mutate(parsed.data)}
          retrying={consume.isPending}
          retryLabel={t("common.tryAgain")}
          retryingLabel={t("common.tryingAgain")}
        />
      );
  } else {
    body = <LoadingState label={t("signIn.verifyLoading")} />;
  }

  return (
    <Page title={failed ? t("signIn.problemTitle") : t("signIn.verifyTitle")} heading={failed ? t("signIn.problemHeading") : t("signIn.verifyHeading")}>
      {body}
    </Page>
  );
}
