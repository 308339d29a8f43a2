import { batchIdParamSchema } from "#shared/schemas/visit-import";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { auditSubject, route, type RouteSpec } from "../../http/route.ts";
import type { PlanChangeHook } from "../plans/service.ts";
import { batchStatus } from "./repo.ts";
import { previewImport, runImport } from "./service.ts";
import { templateCsv } from "./template.ts";
import { accessBeforeUpload, csvUpload, uploadedCsv } from "./upload.ts";

const managerOnly = ["manager"] as const;

/** CSV import of a day's visits; docs/visit-import.md describes the columns and the rules. */
export function visitImportRoutes(db: Db, onChange?: PlanChangeHook): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/visit-imports/template.csv",
      access: managerOnly,
      handler: ({ res }) => {
        res.setHeader("Content-Type", "text/csv; charset=utf-8");
        res.setHeader("Content-Disposition", 'attachment; filename="sproutline-visit-import-template.csv"');
        res.send(templateCsv());
      },
    }),
    route({
      method: "post",
      path: "/api/visit-imports/preview",
      access: managerOnly,
      before: [accessBeforeUpload(managerOnly), csvUpload()],
      handler: async ({ req, user }) => previewImport(db, user, uploadedCsv(req)),
    }),
    route({
      method: "post",
      path: "/api/visit-imports",
      access: managerOnly,
      audit: "customers.imported",
      before: [accessBeforeUpload(managerOnly), csvUpload()],
      handler: async ({ req, res, user }) => {
        const result = await runImport(db, user, uploadedCsv(req), onChange);
        // The file's batch is the record; how many visits it made is what a reader of the log wants.
        auditSubject(res, result.batchId, { created: result.created, total: result.total });
        return result;
      },
    }),
    route({
      method: "get",
      path: "/api/visit-imports/:batchId",
      access: managerOnly,
      params: batchIdParamSchema,
      handler: async ({ user, params }) => {
        const status = await batchStatus(db, user.companyId, params.batchId);
        if (!status) throw notFound("That import");
        return status;
      },
    }),
  ];
}
