/*
 * Which channels a reminder goes out on. The customer's choice first; an opted-out channel or one
 * without a contact is dropped; and when that leaves nothing, the other channel is used if the
 * customer has it and has not opted out of it ("fall back to the other channel when the customer
 * allows it"). "none" always means nothing.
 */
export type Channel = "sms" | "email";
export type ChannelChoice = "sms" | "email" | "both" | "none";
export type Contacts = { email: string | null; phone: string | null };

const other = (c: Channel): Channel => (c === "sms" ? "email" : "sms");

function usable(channel: Channel, contacts: Contacts, optedOut: ReadonlySet<Channel>): boolean {
  return (channel === "sms" ? Boolean(contacts.phone) : Boolean(contacts.email)) && !optedOut.has(channel);
}

export function deliveryChannels(choice: ChannelChoice, contacts: Contacts, optedOut: ReadonlySet<Channel>): Channel[] {
  if (choice === "none") return [];
  const wanted: Channel[] = choice === "both" ? ["sms", "email"] : [choice];
  const chosen = wanted.filter((c) => usable(c, contacts, optedOut));
  if (chosen.length > 0) return chosen;
  if (wanted.length === 1 && usable(other(wanted[0]!), contacts, optedOut)) return [other(wanted[0]!)];
  return [];
}

/** Where a reminder that failed for good on `failed` may go instead, if anywhere. */
export function fallbackChannel(failed: Channel, choice: ChannelChoice, contacts: Contacts, optedOut: ReadonlySet<Channel>): Channel | null {
  if (choice === "none") return null;
  return usable(other(failed), contacts, optedOut) ? other(failed) : null;
}
