import type { Role } from "#shared/schemas/auth";

/** What a request knows about the signed-in person (loaded from the database per request). */
export type SessionUser = {
  id: number;
  companyId: number;
  role: Role;
  name: string;
  email: string | null;
  phone: string | null;
  customerId: number | null;
};
