import { Link } from "react-router-dom";
import { Button, Notice, Page, buttonClasses, formatCalendarDay } from "#shared/ui/index";
import type { ChosenLawn } from "../lib/chosen-lawn.ts";

export interface SavedVisit {
  visitId: number;
  planId: number;
  invitationSent: boolean;
  welcomeChannels: readonly ("sms" | "email")[];
  lawn: ChosenLawn;
  date: string;
}

const channelWords = (channels: readonly ("sms" | "email")[]) => channels.map((c) => (c === "sms" ? "text" : "e-mail")).join(" and ");

/** After a save: what was created and where to find it. */
export function VisitSaved({ saved, onLogAnother }: { saved: SavedVisit; onLogAnother: () => void }) {
  return (
    <Page title="Visit saved" intro={`${saved.lawn.customerName}, ${saved.lawn.street} — ${formatCalendarDay(saved.date, { withYear: true })}`}>
      <div className="flex flex-col gap-4">
        <Notice tone="success" title="The visit and its care plan are saved">
          Care plan {saved.planId} now follows this visit: watering, mowing and feeding dates for the homeowner.
        </Notice>
        {saved.invitationSent ? (
          <Notice tone="info">
            Welcome message queued to {saved.lawn.customerName} by {channelWords(saved.welcomeChannels)}, with a sign-in link and the next days of the plan. It goes
            out within a few minutes, inside the hours the homeowner allows.
          </Notice>
        ) : (
          <Notice tone="info">No welcome message was queued (no mobile number or e-mail on file, or the homeowner turned messages off). The homeowner can still sign in to see the plan.</Notice>
        )}
        <div className="flex flex-wrap gap-2">
          <Link to={`/customers/${saved.lawn.customerId}#plan-${saved.planId}`} className={buttonClasses("primary")} data-testid="saved-plan-link">
            See the care plan
          </Link>
          <Button variant="secondary" onClick={onLogAnother}>
            Log another visit
          </Button>
        </div>
      </div>
    </Page>
  );
}
