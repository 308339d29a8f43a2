import { simpleParser, type AddressObject } from "mailparser";
import type { AddressInfo } from "node:net";
import { SMTPServer, type SMTPServerAddress } from "smtp-server";

/** One e-mail as the fake SMTP server received it. */
export interface ReceivedEmail {
  id: string;
  /** Envelope sender and recipients (MAIL FROM / RCPT TO): who the message really went to. */
  envelopeFrom: string | null;
  envelopeTo: string[];
  /** Header fields as written, e.g. "Sproutline <plans@sproutline.example>". */
  from: string;
  to: string;
  subject: string | null;
  text: string;
  html: string | null;
  messageId: string | null;
  /** Every header as sent, lower-case names; repeated headers are joined with ", ". */
  headers: Record<string, string>;
  listUnsubscribe: string | null;
  receivedAt: string;
}

export interface FakeSmtpOptions {
  port?: number;
  host?: string;
  /** Largest message accepted, in bytes (SIZE extension); bigger ones are refused with 552. */
  maxMessageBytes?: number;
}

export interface FakeSmtpServer {
  host: string;
  port: number;
  messages(): ReceivedEmail[];
  clear(): void;
  /** While down, new connections and new messages get "421 Service not available", a temporary failure. */
  setDown(down: boolean): void;
  isDown(): boolean;
  stop(): Promise<void>;
}

const SERVICE_NOT_AVAILABLE = 421;

export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtpServer> {
  const host = options.host ?? "127.0.0.1";
  const received: ReceivedEmail[] = [];
  let down = false;
  let counter = 0;

  const unavailable = () => Object.assign(new Error("Service not available, closing transmission channel"), { responseCode: SERVICE_NOT_AVAILABLE });

  const server = new SMTPServer({
    // Loopback only and development only: no authentication, no TLS, no reverse DNS look-ups.
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    disableReverseLookup: true,
    size: options.maxMessageBytes ?? 10 * 1024 * 1024,
    logger: false,
    onConnect(_session, callback) {
      callback(down ? unavailable() : null);
    },
    onMailFrom(_address, _session, callback) {
      // A connection opened before the outage (pooled transports) also sees it from the next message on.
      callback(down ? unavailable() : null);
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          if (stream.sizeExceeded) {
            callback(Object.assign(new Error("Message exceeds the size limit"), { responseCode: 552 }));
            return;
          }
          received.push({
            id: `email-${++counter}`,
            envelopeFrom: addressOf(session.envelope.mailFrom),
            envelopeTo: session.envelope.rcptTo.map((r) => r.address),
            from: addressText(parsed.from),
            to: addressText(parsed.to),
            subject: parsed.subject ?? null,
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
            messageId: parsed.messageId ?? null,
            headers: headerMap(parsed.headerLines),
            listUnsubscribe: headerMap(parsed.headerLines)["list-unsubscribe"] ?? null,
            receivedAt: new Date().toISOString(),
          });
          // Answer only once stored, so a test can look for the message as soon as sendMail resolves.
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.server.once("error", reject);
    server.listen(options.port ?? 0, host, () => {
      server.server.off("error", reject);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;

  return {
    host,
    port,
    messages: () => received.map((m) => ({ ...m, envelopeTo: [...m.envelopeTo], headers: { ...m.headers } })),
    clear: () => {
      received.length = 0;
    },
    setDown: (value) => {
      down = value;
    },
    isDown: () => down,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function addressOf(address: SMTPServerAddress | false): string | null {
  return address ? address.address : null;
}

/** "Name <address>" without the quoting mailparser's .text adds, decoded from any MIME encoded-words. */
function addressText(value: AddressObject | AddressObject[] | undefined): string {
  if (!value) return "";
  return (Array.isArray(value) ? value : [value])
    .flatMap((group) => group.value)
    .map((a) => (a.name ? `${a.name} <${a.address ?? ""}>` : (a.address ?? "")))
    .join(", ");
}

/** Header lines come raw ("List-Unsubscribe: <…>"); unfold them so values read as one line. */
function headerMap(lines: ReadonlyArray<{ key: string; line: string }>): Record<string, string> {
  const map: Record<string, string> = {};
  for (const { key, line } of lines) {
    const value = line.slice(line.indexOf(":") + 1).replace(/\r?\n[ \t]+/g, " ").trim();
    map[key] = map[key] ? `${map[key]}, ${value}` : value;
  }
  return map;
}
