import { z } from "zod";
import { bigRecordId } from "#shared/schemas/ids";
import type { AppDeps } from "../../app.ts";
import { notFound } from "../../http/errors.ts";
import { REVALIDATE } from "../../http/cache-control.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { photoStorageFromConfig, type PhotoStorage } from "../../storage/index.ts";
import { findPhotoKeysForUser } from "./repo.ts";

const photoParamsSchema = z.object({
  id: bigRecordId,
  size: z.enum(["large", "thumb"]),
});

export function photoRoutes(deps: Pick<AppDeps, "config" | "db">, storage: PhotoStorage = photoStorageFromConfig(deps.config)): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/photos/:id/:size",
      access: ["customer", "technician", "manager"],
      // Not audited per photo: a thread shows many thumbnails, and reading the thread is audited.
      params: photoParamsSchema,
      handler: async ({ user, params, res }) => {
        const keys = await findPhotoKeysForUser(deps.db, user, params.id);
        const data = keys ? await storage.get(params.size === "large" ? keys.largeKey : keys.thumbKey) : undefined;
        if (!data) throw notFound("That photo");
        res.set({
          "Content-Type": "image/jpeg",
          // Revalidated like every private API answer (server/http/cache-control.ts), so a reader whose
          // access ended cannot keep seeing it from the cache; an unchanged photo costs an empty 304.
          "Cache-Control": REVALIDATE,
          "X-Content-Type-Options": "nosniff",
          "Content-Disposition": `inline; filename="photo-${params.id}-${params.size}.jpg"`,
        });
        res.send(data);
        return undefined;
      },
    }),
  ];
}
