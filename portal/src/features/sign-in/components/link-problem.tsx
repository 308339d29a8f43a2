import { useTranslation } from "react-i18next";
import { Link } from "react-router-dom";
import { buttonClasses } from "#shared/ui/index";

const explanationKeys = {
  link_expired: { title: "signIn.expiredTitle", detail: "signIn.expiredDetail" },
  link_used: { title: "signIn.usedTitle", detail: "signIn.usedDetail" },
  link_invalid: { title: "signIn.invalidTitle", detail: "signIn.invalidDetail" },
} as const;

/** What went wrong with a sign-in link, and the way forward: a new link. */
export function LinkProblem({ code }: { code: string }) {
  const { t } = useTranslation();
  const keys = code in explanationKeys ? explanationKeys[code as keyof typeof explanationKeys] : explanationKeys.link_invalid;
  return (
    <section role="alert" className="rounded-xl border-l-4 border-rust-700 bg-rust-50 p-5">
      <h2 className="text-2xl text-rust-700">{t(keys.title)}</h2>
      <p className="mt-2">{t(keys.detail)}</p>
      <Link to="/sign-in" className={buttonClasses("primary", "mt-4")}>
        {t("signIn.newLink")}
      </Link>
    </section>
  );
}
