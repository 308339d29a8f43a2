import { readFileSync } from "node:fs";
import type { AddressInfo } from "node:net";
import { SMTPServer, type SMTPServerOptions } from "smtp-server";
import { parseInbound } from "./parse.ts";
import { fileInboundEmail, type EmailReplyDeps, type FilingOutcome } from "./service.ts";

/*
 * The inbound SMTP listener: the company points its reply domain's MX (or a relay such as its mail
 * provider's forwarding) at it. It takes mail only for addresses at INBOUND_EMAIL_DOMAIN, so it is
 * no open relay; there is no SMTP AUTH, since the sender is any homeowner's mail provider. In
 * production it sits behind the company's MX or relay, which does spam and virus filtering; on its
 * own it offers STARTTLS when a key and certificate are configured.
 */
export type InboundSmtpOptions = {
  host: string;
  port: number;
  maxBytes: number;
  tls?: { keyFile: string; certFile: string };
  /** Told about each filed, duplicate or unmatched e-mail (logs, tests). */
  onFiled?: (outcome: FilingOutcome) => void;
};

export type InboundSmtp = { port: number; close(): Promise<void> };

const smtpError = (message: string, responseCode: number) => Object.assign(new Error(message), { responseCode });

export async function startInboundSmtp(deps: EmailReplyDeps, options: InboundSmtpOptions): Promise<InboundSmtp> {
  const domain = deps.inboundDomain.toLowerCase();
  const tls: Partial<SMTPServerOptions> = options.tls ? { key: readFileSync(options.tls.keyFile), cert: readFileSync(options.tls.certFile) } : {};

  const server = new SMTPServer({
    ...tls,
    name: domain,
    banner: "Sproutline reply desk",
    authOptional: true,
    disabledCommands: options.tls ? ["AUTH"] : ["AUTH", "STARTTLS"],
    disableReverseLookup: true,
    size: options.maxBytes,
    // Each connection may hold a message of maxBytes and its photos in memory while it is filed.
    maxClients: 20,
    logger: false,
    onRcptTo(address, _session, callback) {
      const at = address.address.lastIndexOf("@");
      if (at < 0 || address.address.slice(at + 1).toLowerCase() !== domain) {
        // Refused at RCPT time, so the sending server bounces it at once and nothing is stored.
        callback(smtpError(`5.7.1 <${address.address}>: relay not permitted, this server only takes mail for ${domain}`, 550));
        return;
      }
      callback();
    },
    onData(stream, session, callback) {
      const recipients = session.envelope.rcptTo.map((r) => r.address);
      parseInbound(stream, recipients)
        .then(async (email) => {
          if (stream.sizeExceeded) {
            callback(smtpError(`5.3.4 Message is larger than ${options.maxBytes} bytes`, 552));
            return;
          }
          const outcome = await fileInboundEmail(deps, email);
          options.onFiled?.(outcome);
          callback();
        })
        .catch((err: unknown) => {
          deps.log("could not file an inbound e-mail; the sending server will retry", err);
          // A temporary failure: the sending server retries, and the Message-ID keeps a retry from filing twice.
          callback(smtpError("4.3.0 Could not store the message right now, please try again later", 451));
        });
    },
  });
  server.on("error", (err) => deps.log("inbound SMTP error", err));

  await new Promise<void>((resolve, reject) => {
    server.server.once("error", reject);
    server.listen(options.port, options.host, () => {
      server.server.off("error", reject);
      resolve();
    });
  });
  return {
    port: (server.server.address() as AddressInfo).port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
