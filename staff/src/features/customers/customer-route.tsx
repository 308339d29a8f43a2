import { useEffect } from "react";
import { Link, useLocation, useParams } from "react-router-dom";
import { ErrorState, LoadingState, NotFoundPage, Page, isApiRequestError } from "#shared/ui/index";
import { useCustomer } from "./api/get-customer.ts";
import { ConversationList } from "./components/conversation-list.tsx";
import { FollowUpList } from "./components/follow-up-list.tsx";
import { PlanCard } from "./components/plan-card.tsx";
import { PropertyList } from "./components/property-list.tsx";
import { ReminderDisclosure } from "./components/reminder-disclosure.tsx";
import { Section } from "./components/section.tsx";
import { VisitList } from "./components/visit-list.tsx";

export function CustomerRoute() {
  const id = Number(useParams().customerId);
  if (!Number.isInteger(id) || id <= 0) return <NotFoundPage />;
  return <CustomerPage id={id} />;
}

const back = (
  <Link to="/customers" className="inline-flex min-h-11 items-center font-semibold">
    ← Customers
  </Link>
);

/** Everything about one customer a technician needs before a visit or an answer. */
function CustomerPage({ id }: { id: number }) {
  const customer = useCustomer(id);
  useScrollToHash(Boolean(customer.data));

  if (isApiRequestError(customer.error) && customer.error.status === 404) return <NotFoundPage />;
  if (customer.isError) {
    return (
      <Page title="Customer" intro={back} width="wide">
        <ErrorState title="This customer didn't load" error={customer.error} onRetry={() => void customer.refetch()} retrying={customer.isRefetching} />
      </Page>
    );
  }
  if (!customer.data) {
    return (
      <Page title="Customer" intro={back} width="wide">
        <LoadingState label="Loading the customer…" />
      </Page>
    );
  }

  const { customer: c, properties, plans, visits, followUps, conversations, reminders } = customer.data;
  const name = `${c.firstName} ${c.lastName}`;
  const streetOf = (propertyId: number) => properties.find((p) => p.id === propertyId)?.street ?? "another lawn";
  const streetOfPlan = (planId: number) => plans.find((p) => p.id === planId)?.street ?? "another lawn";
  return (
    <Page
      title={name}
      width="wide"
      intro={
        <>
          {back}
          <p className="[overflow-wrap:anywhere]">{[c.phone, c.email, c.externalRef && `Customer no. ${c.externalRef}`].filter(Boolean).join(" · ")}</p>
        </>
      }
    >
      <div className="flex flex-col gap-8">
        <Section title="Care plans" count={plans.length} empty="No care plan yet. Logging a visit creates one.">
          <div className="grid gap-3 md:grid-cols-2">
            {plans.map((plan) => (
              <PlanCard key={plan.id} plan={plan} />
            ))}
          </div>
        </Section>
        <Section title="Conversations" count={conversations.length} empty="No questions or messages yet.">
          <ConversationList conversations={conversations} streetOfPlan={streetOfPlan} />
        </Section>
        <Section title="Follow-up visits" count={followUps.length} empty="No follow-up visits.">
          <FollowUpList followUps={followUps} />
        </Section>
        <Section title="Visits" count={visits.length} empty="No visits logged yet.">
          <VisitList visits={visits} streetOf={streetOf} />
        </Section>
        <Section title="Lawns" count={properties.length} empty="No lawns recorded.">
          <PropertyList properties={properties} />
        </Section>
        <ReminderDisclosure reminders={reminders} />
      </div>
    </Page>
  );
}

/** "#plan-12" from the visit log's success screen: bring that plan into view once it is on the page. */
function useScrollToHash(ready: boolean) {
  const { hash } = useLocation();
  useEffect(() => {
    if (!ready || !hash) return;
    const target = document.getElementById(decodeURIComponent(hash.slice(1)));
    target?.scrollIntoView({ block: "start" });
    target?.focus({ preventScroll: true });
  }, [ready, hash]);
}
