import express from "express";
import { listenHttp } from "../http-listen.ts";

/** One webhook call as a receiving app saw it. */
export interface ReceivedWebhook {
  path: string;
  /** The full URL the caller used, which is what Twilio signs. */
  url: string;
  params: Record<string, string>;
  signature: string | undefined;
}

/**
 * A stand-in for our app in tests: records form-encoded webhook calls (status callbacks, inbound
 * SMS) and answers with whatever reply() returns.
 */
export async function startWebhookReceiver(reply: (hook: ReceivedWebhook) => { status: number; type?: string; body?: string } = () => ({ status: 204 })) {
  const received: ReceivedWebhook[] = [];
  const waiters: Array<() => void> = [];
  const app = express();
  app.use(express.urlencoded({ extended: false }));
  let baseUrl = "";
  app.use((req, res) => {
    const hook: ReceivedWebhook = {
      path: req.path,
      url: baseUrl + req.originalUrl,
      params: { ...(req.body as Record<string, string>) },
      signature: req.header("X-Twilio-Signature"),
    };
    received.push(hook);
    waiters.splice(0).forEach((wake) => wake());
    const answer = reply(hook);
    res.status(answer.status);
    if (answer.type) res.type(answer.type);
    res.send(answer.body ?? "");
  });
  const running = await listenHttp(app, 0, "127.0.0.1");
  baseUrl = running.url;

  return {
    url: running.url,
    received,
    /** Resolves once at least `count` calls matching `filter` have arrived, or rejects after timeoutMs. */
    async waitFor(count: number, filter: (hook: ReceivedWebhook) => boolean = () => true, timeoutMs = 5_000): Promise<ReceivedWebhook[]> {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const matching = received.filter(filter);
        if (matching.length >= count) return matching;
        const left = deadline - Date.now();
        if (left <= 0) throw new Error(`expected ${count} webhook calls, got ${matching.length}`);
        await new Promise<void>((wake) => {
          const timer = setTimeout(wake, left);
          waiters.push(() => {
            clearTimeout(timer);
            wake();
          });
        });
      }
    },
    stop: () => running.close(),
  };
}
