import { followUpTransitions, type FollowUp, type FollowUpStatus } from "#shared/schemas/follow-ups";
import { Button } from "#shared/ui/index";
import { moveLabels } from "../lib/labels.ts";

export interface FollowUpActionsProps {
  followUp: FollowUp;
  onOpen: (followUp: FollowUp, targetStatus?: FollowUpStatus) => void;
}

/**
 * The next usual step as a button, plus "Edit" for everything else. Both open the dialog,
 * because most moves need more (a date, a technician, a callback's hours).
 */
export function FollowUpActions({ followUp, onOpen }: FollowUpActionsProps) {
  const next = followUpTransitions[followUp.status][0];
  const who = `for ${followUp.customerName}`;
  // A closed record is final, except that a manager may still correct a callback's cost and outcome.
  const editable = followUp.status !== "closed" || followUp.isCallback;
  return (
    <div className="flex flex-wrap gap-2">
      {next && (
        <Button variant="secondary" className="px-3" onClick={() => onOpen(followUp, next)}>
          {moveLabels[next]}
          <span className="sr-only"> {who}</span>
        </Button>
      )}
      {editable && (
        <Button variant="quiet" className="px-3" onClick={() => onOpen(followUp)}>
          {followUp.status === "closed" ? "Correct cost" : "Edit"}
          <span className="sr-only"> {who}</span>
        </Button>
      )}
    </div>
  );
}
