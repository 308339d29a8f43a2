import { useId, useState } from "react";
import { SPECIES_FACTS, type Species } from "#shared/engine/index";
import { Button, FieldError, Notice, SelectField, errorMessage } from "#shared/ui/index";
import { useRenderSavedReply } from "../api/render-saved-reply.ts";
import { useSavedReplies } from "../api/get-saved-replies.ts";

const placeholderWords: Record<string, string> = {
  firstName: "first name",
  visitDate: "visit date",
  firstMowDate: "first mow date",
  companyName: "company name",
};

/**
 * Picks one of the manager's saved replies and puts it in the answer with this homeowner's
 * name and plan dates filled in by the server, ready to edit before sending.
 */
export function SavedReplyPicker({ planId, onInsert }: { planId: number; onInsert: (text: string) => void }) {
  const replies = useSavedReplies();
  const render = useRenderSavedReply(planId);
  const [replyId, setReplyId] = useState("");
  const [missing, setMissing] = useState<string[]>([]);
  const [otherGrasses, setOtherGrasses] = useState<Species[]>([]);
  const statusId = useId();

  if (replies.isPending) return <p className="text-ink-soft">Loading saved replies…</p>;
  if (replies.isError) return <FieldError message={`Saved replies didn't load: ${errorMessage(replies.error)}`} />;
  if (replies.data.length === 0) return <p className="text-ink-soft">No saved replies yet. A manager can add replies for common questions.</p>;

  const use = () => {
    if (!replyId) return;
    render.mutate(Number(replyId), {
      onSuccess: ({ text, missing, speciesNotInLawn }) => {
        setMissing(missing);
        setOtherGrasses(speciesNotInLawn);
        onInsert(text);
      },
    });
  };

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-col gap-2 sm:flex-row sm:items-end">
        <SelectField
          label="Saved reply"
          className="flex-1"
          value={replyId}
          onChange={(event) => setReplyId(event.target.value)}
          placeholderOption="Pick a saved reply"
          options={replies.data.map((reply) => ({ value: String(reply.id), label: reply.title }))}
        />
        <Button variant="secondary" onClick={use} disabled={!replyId} pending={render.isPending} pendingLabel="Filling in…" aria-describedby={statusId}>
          Use this reply
        </Button>
      </div>
      <div id={statusId} aria-live="polite">
        {render.isError && <FieldError message={errorMessage(render.error)} />}
        {render.isSuccess && otherGrasses.length > 0 && (
          <Notice tone="warning" title="Check the grass named">
            <span data-testid="saved-reply-other-grasses">
              This reply mentions {listWords(otherGrasses.map((s) => SPECIES_FACTS[s].name))}, not in this lawn or its seed mix. Change it before sending.
            </span>
          </Notice>
        )}
        {render.isSuccess && missing.length > 0 && (
          <Notice tone="warning">
            This plan has no {missing.map((m) => placeholderWords[m] ?? m).join(" or ")} yet, so the reply says it in general words. Read it before sending.
          </Notice>
        )}
      </div>
    </div>
  );
}

/** "a", "a and b", "a, b and c". */
function listWords(words: readonly string[]): string {
  return words.length <= 1 ? (words[0] ?? "") : `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}
