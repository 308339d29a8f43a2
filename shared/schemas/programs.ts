import { z } from "zod";

/** Saving the company's care-program settings as a new version; the version number is the server's. */
export const saveProgramSchema = z.object({
  settings: z.record(z.string(), z.unknown()),
  /** The version the manager started from; a newer one saved meanwhile answers 409. */
  basedOnVersion: z.number().int().positive().optional(),
});
