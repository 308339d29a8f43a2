import type { TeamMember } from "#shared/schemas/team";

export const roleNames: Record<TeamMember["role"], string> = { technician: "Technician", manager: "Manager" };

export const roleOptions = [
  { value: "technician", label: "Technician" },
  { value: "manager", label: "Manager" },
];

export const roleHint = "Technicians answer questions and log visits; managers also see reports, programs, imports and the team.";

const dateFormat = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "short", year: "numeric" });
export const formatDate = (iso: string) => dateFormat.format(new Date(iso));
