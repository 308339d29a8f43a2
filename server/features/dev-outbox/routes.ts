import { outboxResponseSchema } from "#shared/schemas/outbox";
import type { Config } from "../../config.ts";
import { HttpError } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";

/**
 * Shows staff what the local fakes received, so a demo can follow a link from a message.
 * Exists only when fakes are configured, which production refuses.
 */
export function devOutboxRoutes(config: Config): RouteSpec[] {
  const controlUrl = config.FAKES_CONTROL_URL;
  if (!controlUrl || config.NODE_ENV === "production") return [];
  return [
    route({
      method: "get",
      path: "/api/dev/outbox",
      access: ["technician", "manager"],
      handler: async () => {
        const response = await fetch(`${controlUrl}/__outbox`).catch(() => undefined);
        if (!response?.ok) throw new HttpError(503, "fakes_unavailable", "The local message fakes are not answering.");
        return outboxResponseSchema.parse(await response.json());
      },
    }),
  ];
}
