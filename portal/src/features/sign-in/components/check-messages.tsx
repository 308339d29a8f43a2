import { Button } from "#shared/ui/index";

export interface CheckMessagesProps {
  contact: string;
  onUseAnother: () => void;
}

/** Worded the same whether or not the contact is on file, so it can't be used to probe for accounts. */
export function CheckMessages({ contact, onUseAnother }: CheckMessagesProps) {
  return (
    <section aria-labelledby="check-messages-heading" className="rounded-xl border-2 border-pine-700 bg-pine-50 p-5" role="status">
      <h2 id="check-messages-heading" className="text-2xl text-pine-900">
        Check your messages
      </h2>
      <p className="mt-2">
        If <strong className="[overflow-wrap:anywhere]">{contact}</strong> is on file with your lawn-care company, a sign-in
        link is on its way by e-mail or text message.
      </p>
      <ul className="mt-3 list-disc space-y-1 pl-5 text-ink-soft">
        <li>Open the link on this phone or computer.</li>
        <li>It works once and expires soon.</li>
        <li>Nothing after a few minutes? Check spam, or ask for a new link.</li>
      </ul>
      <Button variant="secondary" className="mt-4" onClick={onUseAnother}>
        Ask for another link
      </Button>
    </section>
  );
}
