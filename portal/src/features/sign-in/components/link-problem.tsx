import { Link } from "react-router-dom";
import { buttonClasses } from "#shared/ui/index";

const explanations: Record<string, { title: string; detail: string }> = {
  link_expired: {
    title: "This sign-in link has expired",
    detail: "Links only work for a short while, to keep your account safe. Ask for a new one and open it soon after it arrives.",
  },
  link_used: {
    title: "This sign-in link has already been used",
    detail: "Each link works once. If that wasn't you on another device, ask for a new link now.",
  },
  link_invalid: {
    title: "This sign-in link doesn't work",
    detail: "Part of the link may be missing — some apps cut long links short. Ask for a new one and open it straight from the message.",
  },
};

/** What went wrong with a sign-in link, and the way forward: a new link. */
export function LinkProblem({ code }: { code: string }) {
  const explanation = explanations[code] ?? explanations.link_invalid!;
  return (
    <section role="alert" className="rounded-xl border-l-4 border-rust-700 bg-rust-50 p-5">
      <h2 className="text-2xl text-rust-700">{explanation.title}</h2>
      <p className="mt-2">{explanation.detail}</p>
      <Link to="/sign-in" className={buttonClasses("primary", "mt-4")}>
        Send me a new link
      </Link>
    </section>
  );
}
