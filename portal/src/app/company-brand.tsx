import { useTranslation } from "react-i18next";
import type { PublicCompany } from "#shared/schemas/company";
import { SproutMark } from "#shared/ui/index";
import { formatPhone } from "../common/lib/phone.ts";

/**
 * The company's logo and name, where the homeowner looks first: it is their lawn-care company
 * that speaks to them. The logo is decorative next to the name (alt=""), so the name is read once.
 */
export function CompanyBrand({ company }: { company: PublicCompany }) {
  return (
    <>
      {company.logoUrl ? (
        <img src={company.logoUrl} alt="" className="h-10 w-auto max-w-24 shrink-0 object-contain" data-testid="company-logo" />
      ) : (
        <SproutMark />
      )}
      <span className="min-w-0 truncate">{company.name}</span>
    </>
  );
}

/** Tap to call or text the office. Shown only once a manager has set the number. */
export function OfficeContact({ company }: { company: PublicCompany | undefined }) {
  const { t } = useTranslation();
  if (!company?.phone) return null;
  const shown = formatPhone(company.phone);
  const link =
    "inline-flex min-h-11 items-center gap-1.5 rounded-lg border border-line-strong px-3 font-semibold text-pine-900 no-underline hover:bg-pine-50 focus-visible:outline-2";
  return (
    <div className="border-t border-line bg-pine-50 print:hidden">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-3 gap-y-1 px-4 py-1.5">
        <p className="text-sm text-ink-soft">
          {t("shell.office")} <span className="font-semibold whitespace-nowrap text-ink">{shown}</span>
        </p>
        <div className="ml-auto flex gap-2">
          <a href={`tel:${company.phone}`} className={link} aria-label={t("shell.callOffice", { company: company.name, phone: shown })}>
            <PhoneIcon />
            {t("shell.call")}
          </a>
          <a href={`sms:${company.phone}`} className={link} aria-label={t("shell.textOffice", { company: company.name, phone: shown })}>
            <TextIcon />
            {t("shell.text")}
          </a>
        </div>
      </div>
    </div>
  );
}

const icon = {
  viewBox: "0 0 24 24",
  "aria-hidden": true,
  focusable: false,
  className: "size-5 shrink-0",
  fill: "none",
  stroke: "currentColor",
  strokeWidth: 2,
  strokeLinecap: "round",
  strokeLinejoin: "round",
} as const;

function PhoneIcon() {
  return (
    <svg {...icon}>
      <path d="M6.5 3h3l1.5 4.5-2 1.5a11 11 0 0 0 6 6l1.5-2 4.5 1.5v3a2 2 0 0 1-2 2A16 16 0 0 1 4.5 5a2 2 0 0 1 2-2Z" />
    </svg>
  );
}

function TextIcon() {
  return (
    <svg {...icon}>
      <path d="M4 5h16v11H9l-5 4Z" />
      <path d="M8 9.5h8M8 12.5h5" />
    </svg>
  );
}
