import { Notice } from "#shared/ui/index";
import { usePublicCompany } from "../api/get-public-company.ts";

/** Explains why the last Google sign-in was refused (?error=… set by the server's redirect). */
export function SignInError({ code }: { code: string }) {
  const company = usePublicCompany(code === "not_staff");

  switch (code) {
    case "not_staff": {
      // "Greenway Lawn Co." already ends the sentence; don't add a second full stop.
      const list = company.data ? `the staff list of ${company.data.name.replace(/\.$/, "")}` : "this company's staff list";
      return (
        <Notice tone="danger" title="You're not on the staff list">
          This Google account isn't on {list}. Ask your manager to invite you, then sign in again with the account they invited.
        </Notice>
      );
    }
    case "deactivated":
      return (
        <Notice tone="danger" title="Your staff account is switched off">
          A manager has deactivated this account. Ask your manager if you need access again.
        </Notice>
      );
    case "unverified":
      return (
        <Notice tone="danger" title="Google hasn't verified this e-mail address">
          Verify the address with Google first, or sign in with the account your manager invited.
        </Notice>
      );
    default:
      return (
        <Notice tone="danger" title="Sign-in didn't finish">
          Google sign-in was cancelled or failed. Please try again.
        </Notice>
      );
  }
}
