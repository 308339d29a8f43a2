import { Page, firstName, useSignedInUser } from "#shared/ui/index";
import { SignedInAs } from "./components/signed-in-as.tsx";

export function HomeRoute() {
  const user = useSignedInUser();
  return (
    <Page title="Home" heading={`Hello, ${firstName(user)}`} width="wide">
      <SignedInAs user={user} />
    </Page>
  );
}
