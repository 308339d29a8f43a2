import http from "node:http";
import type { AddressInfo } from "node:net";

/** An HTTP server listening on loopback, with a close() that does not hang. */
export interface RunningHttpServer {
  server: http.Server;
  port: number;
  url: string;
  close(): Promise<void>;
}

/** Listens on host:port (port 0 picks a free one) and reports the base URL actually bound. */
export async function listenHttp(handler: http.RequestListener, port: number, host: string): Promise<RunningHttpServer> {
  const server = http.createServer(handler);
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const bound = (server.address() as AddressInfo).port;
  const hostInUrl = host.includes(":") ? `[${host}]` : host;
  return {
    server,
    port: bound,
    url: `http://${hostInUrl}:${bound}`,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        // Clients such as the Twilio SDK keep sockets alive; without this, close() waits for their idle timeout.
        server.closeAllConnections();
      }),
  };
}
