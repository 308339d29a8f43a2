import multer, { MulterError } from "multer";
import type { NextFunction, Request, Response } from "express";
import { companyIdParamsSchema, companyProfileUpdateSchema, logoLimits } from "#shared/schemas/company";
import type { AppDeps } from "../../app.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { checkAccess, route, type RouteSpec } from "../../http/route.ts";
import { photoStorageFromConfig, type PhotoStorage } from "../../storage/index.ts";
import * as repo from "./repo.ts";
import { setOfficePhone, toPublicCompany, uploadLogo } from "./service.ts";

const managers = ["manager"] as const;

/** The logo's path never changes meaning (its URL carries a version), so browsers and mail clients may keep it a day. */
const LOGO_CACHE_SECONDS = 24 * 60 * 60;

/** One file, in memory, with hard limits; only managers get as far as parsing it. */
function logoUpload() {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: logoLimits.maxBytes, files: 1, fields: 2, parts: 3 },
  }).single("logo");
  return (req: Request, res: Response, next: NextFunction) => {
    checkAccess(managers, req.user as SessionUser | undefined);
    parse(req, res, (err?: unknown) => {
      if (!err) return next();
      if (err instanceof MulterError && err.code === "LIMIT_FILE_SIZE") {
        return next(new HttpError(413, "file_too_large", `The logo must be smaller than ${logoLimits.maxBytes / (1024 * 1024)} MB.`));
      }
      next(new HttpError(400, "invalid_upload", 'Send one image in the "logo" field.'));
    });
  };
}

/**
 * The company this deployment serves: its name before sign-in (staff sign-in page), and its
 * name, office phone and logo for the homeowner's header, e-mails and printed plan.
 */
export function companyRoutes(deps: Pick<AppDeps, "config" | "db">, storage: PhotoStorage = photoStorageFromConfig(deps.config)): RouteSpec[] {
  const { db } = deps;
  return [
    route({
      method: "get",
      path: "/api/company",
      access: "public",
      handler: async ({ req }) => {
        // Signed in, it is the person's own company; before sign-in, the deployment's.
        const user = req.user as SessionUser | undefined;
        const company = user ? await repo.findCompany(db, user.companyId) : await repo.firstCompany(db);
        if (!company) throw notFound("The company");
        return { company: toPublicCompany(company) };
      },
    }),
    route({
      method: "patch",
      path: "/api/company",
      access: managers,
      body: companyProfileUpdateSchema,
      handler: async ({ user, body }) => {
        await setOfficePhone(db, user.companyId, body.phone);
        return { company: toPublicCompany((await repo.findCompany(db, user.companyId))!) };
      },
    }),
    route({
      method: "post",
      path: "/api/company/logo",
      access: managers,
      before: [logoUpload()],
      handler: async ({ req, user }) => {
        await uploadLogo(db, storage, user.companyId, req.file?.buffer);
        return { company: toPublicCompany((await repo.findCompany(db, user.companyId))!) };
      },
    }),
    route({
      method: "get",
      path: "/api/companies/:companyId/logo",
      // Public on purpose: e-mails and the printed plan show it with no session.
      access: "public",
      params: companyIdParamsSchema,
      handler: async ({ params, res }) => {
        const company = await repo.findCompany(db, params.companyId);
        const data = company?.logo_key ? await storage.get(company.logo_key) : undefined;
        if (!data) throw notFound("That logo");
        res.set({
          "Content-Type": "image/png",
          "Cache-Control": `public, max-age=${LOGO_CACHE_SECONDS}`,
          "X-Content-Type-Options": "nosniff",
          "Content-Disposition": `inline; filename="logo-${params.companyId}.png"`,
        });
        res.send(data);
        return undefined;
      },
    }),
  ];
}
