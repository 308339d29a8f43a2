import { useTranslation } from "react-i18next";
import { useCompany } from "../../../common/api/get-company.ts";
import { formatPhone } from "../../../common/lib/phone.ts";

/**
 * Top of the printed plan: the company's logo, name and office number, so the sheet on the
 * fridge says who made it and who to call. Paper only; on screen the header already shows it.
 */
export function PrintedCompany() {
  const { t } = useTranslation();
  const { data: company } = useCompany();
  if (!company) return null;
  return (
    <div className="printed-company mb-6 hidden items-center gap-4 border-b pb-4 print:flex" data-testid="printed-company">
      {company.logoUrl && <img src={company.logoUrl} alt="" className="h-16 w-auto max-w-40 object-contain" />}
      <div>
        <p className="font-heading text-xl font-bold">{t("plan.printedFrom", { company: company.name })}</p>
        {company.phone && <p>{t("plan.printedCall", { phone: formatPhone(company.phone) })}</p>}
      </div>
    </div>
  );
}
