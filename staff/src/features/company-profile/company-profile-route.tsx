import { ErrorState, LoadingState, Page } from "#shared/ui/index";
import { useCompanyProfile } from "./api/get-company-profile.ts";
import { LogoForm } from "./components/logo-form.tsx";
import { PhoneForm } from "./components/phone-form.tsx";

/** Managers: how the company presents itself to homeowners (logo and office phone). */
export function CompanyProfileRoute() {
  const profile = useCompanyProfile();
  return (
    <Page title="Company profile" intro="What homeowners see of your company in their portal, messages and printed plans.">
      {profile.data ? (
        <div className="flex flex-col gap-6">
          <p>
            Company name: <strong>{profile.data.name}</strong>
          </p>
          <LogoForm logoUrl={profile.data.logoUrl} companyName={profile.data.name} />
          <PhoneForm key={profile.data.phone ?? ""} phone={profile.data.phone} />
        </div>
      ) : profile.isError ? (
        <ErrorState title="The company profile could not be loaded" error={profile.error} onRetry={() => void profile.refetch()} retrying={profile.isFetching} />
      ) : (
        <LoadingState label="Loading the company profile…" />
      )}
    </Page>
  );
}
