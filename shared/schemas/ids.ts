import { z } from "zod";

/** Ids of `serial` columns: PostgreSQL integers stop at 2^31 − 1. */
export const recordId = z.coerce
  .number()
  .int("Must be a whole number")
  .positive("Must be a positive number")
  .max(2_147_483_647, "No record has an id that large");

/** Ids of `bigserial` columns, limited to what a JavaScript number holds exactly. */
export const bigRecordId = z.coerce
  .number()
  .int("Must be a whole number")
  .positive("Must be a positive number")
  .max(Number.MAX_SAFE_INTEGER, "No record has an id that large");
