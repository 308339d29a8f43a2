import { Button, errorMessage, useSignedInUser } from "#shared/ui/index";
import { useAssignQuestion } from "../../../common/api/assign-question.ts";
import { useOpenQuestion } from "../../../common/api/open-questions.ts";

/** Who has the open question, with "Assign to me" or "Unassign"; nothing once it is resolved. */
export function AssignQuestion({ messageId }: { messageId: number }) {
  const user = useSignedInUser();
  const question = useOpenQuestion(messageId);
  const assign = useAssignQuestion();
  if (!question.data) return null;
  const mine = question.data.assignedToId === user.id;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <p>
        Assigned to: {question.data.assignedToName ?? <span className="text-ink-soft">nobody yet</span>}
      </p>
      <Button
        variant="secondary"
        pending={assign.isPending}
        onClick={() => assign.mutate({ messageId, userId: mine ? null : user.id, userName: mine ? null : user.name })}
      >
        {mine ? "Unassign" : "Assign to me"}
      </Button>
      {assign.isError && (
        <p role="alert" className="w-full text-rust-700">
          {errorMessage(assign.error)}
        </p>
      )}
    </div>
  );
}
