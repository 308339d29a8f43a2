import { useTranslation } from "react-i18next";
import { EmptyState } from "#shared/ui/index";

/** Honest until the first visit is logged: there is no plan yet, and we say what will come. */
export function NoPlanYet({ companyName }: { companyName: string }) {
  const { t } = useTranslation();
  return (
    <EmptyState title={t("today.noPlan.title")} icon={<CalendarSprout />}>
      <p>{t("today.noPlan.body", { company: companyName })}</p>
    </EmptyState>
  );
}

function CalendarSprout() {
  return (
    <svg viewBox="0 0 48 48" className="size-12" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" strokeLinejoin="round">
      <rect x="6" y="9" width="36" height="33" rx="4" />
      <path d="M6 18h36M15 5v8M33 5v8" />
      <path d="M24 37v-9m0 3c0-4-3-6-7-6 0 4 3 6 7 6Zm0-2c0-3.5 2.5-5.5 6-5.5 0 3.5-2.5 5.5-6 5.5Z" />
    </svg>
  );
}
