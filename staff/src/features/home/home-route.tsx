import { useSearchParams } from "react-router-dom";
import { ErrorState, LoadingState, Page, SelectField, firstName, useSignedInUser } from "#shared/ui/index";
import { useStaffDay } from "./api/get-staff-day.ts";
import { SignedInAs } from "./components/signed-in-as.tsx";
import { StaffDay } from "./components/staff-day.tsx";

/** Staff home: the day ahead. Technicians see their own; managers the company's, or one person's. */
export function HomeRoute() {
  const user = useSignedInUser();
  const [params, setParams] = useSearchParams();
  const picked = Number(params.get("person"));
  const technicianId = user.role === "manager" && Number.isInteger(picked) && picked > 0 ? picked : null;
  const day = useStaffDay(technicianId);

  return (
    <Page title="Home" heading={`Hello, ${firstName(user)}`} width="wide">
      <div className="flex flex-col gap-6">
        <SignedInAs user={user} />
        <section aria-labelledby="day-heading" className="flex flex-col gap-5">
          <h2 id="day-heading" className="text-2xl text-pine-900">
            {user.role === "manager" ? "The day" : "Your day"}
          </h2>
          {user.role === "manager" && day.data && (
            <SelectField
              label="Whose day"
              className="max-w-sm"
              value={technicianId === null ? "" : String(technicianId)}
              placeholderOption="Whole company"
              options={day.data.technicians.map((t) => ({ value: String(t.id), label: t.name }))}
              onChange={(e) => setParams(e.target.value ? { person: e.target.value } : {}, { replace: true })}
            />
          )}
          {day.isPending && <LoadingState label="Loading your day…" />}
          {day.isError && <ErrorState title="Your day didn't load" error={day.error} onRetry={() => void day.refetch()} retrying={day.isRefetching} />}
          {day.data && <StaffDay day={day.data} now={new Date(day.dataUpdatedAt)} />}
        </section>
      </div>
    </Page>
  );
}
