/**
 * An E.164 number as people read it. North American numbers get the familiar
 * (330) 555-0100; others stay in international form, which any phone can dial.
 * Kept tiny on purpose: a phone-number library would weigh more than the whole header.
 */
export function formatPhone(e164: string): string {
  const nanp = /^\+1(\d{3})(\d{3})(\d{4})$/.exec(e164);
  return nanp ? `(${nanp[1]}) ${nanp[2]}-${nanp[3]}` : e164;
}
