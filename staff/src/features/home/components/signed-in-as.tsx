import type { CurrentUser } from "#shared/schemas/auth";
import { roleLabel } from "#shared/ui/index";

/** Who is signed in and with what role, so nobody acts with the wrong account. */
export function SignedInAs({ user }: { user: CurrentUser }) {
  return (
    <section aria-labelledby="signed-in-as-heading" className="rounded-xl border border-line bg-surface p-5">
      <h2 id="signed-in-as-heading" className="sr-only">
        Your account
      </h2>
      <p className="text-lg">
        Signed in as <strong>{user.name}</strong> — <strong data-testid="staff-role">{roleLabel(user.role)}</strong>
      </p>
      <dl className="mt-3 grid gap-x-6 gap-y-1 text-ink-soft sm:grid-cols-[auto_1fr]">
        <dt className="font-semibold text-ink">Company</dt>
        <dd>{user.companyName}</dd>
        {user.email && (
          <>
            <dt className="font-semibold text-ink">E-mail</dt>
            <dd className="[overflow-wrap:anywhere]">{user.email}</dd>
          </>
        )}
      </dl>
    </section>
  );
}
