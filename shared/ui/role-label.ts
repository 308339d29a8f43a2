import type { Role } from "#shared/schemas/auth";

const labels: Record<Role, string> = {
  customer: "Homeowner",
  technician: "Technician",
  manager: "Manager",
};

/** The role as people say it ("Manager"), for headers and "signed in as" lines. */
export function roleLabel(role: Role): string {
  return labels[role];
}
