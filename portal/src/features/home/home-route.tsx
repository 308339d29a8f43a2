import { Page, firstName, useSignedInUser } from "#shared/ui/index";
import { CarePlanEmpty } from "./components/care-plan-empty.tsx";

export function HomeRoute() {
  const user = useSignedInUser();
  return (
    <Page title="Your care plan" heading={`Hello, ${firstName(user)}`} intro={`Your care plan from ${user.companyName}`}>
      <CarePlanEmpty companyName={user.companyName} />
    </Page>
  );
}
