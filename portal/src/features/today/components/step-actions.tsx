import { useEffect, useRef, useState } from "react";
import { useTranslation } from "react-i18next";
import type { StoredStep } from "#shared/schemas/plans";
import { Button } from "#shared/ui/index";
import { useChangeStepState, type ChangeStepStateInput } from "../../../common/api/change-step-state.ts";
import { useErrorText } from "../../../common/lib/use-error-text.ts";
import { SkipDialog } from "./skip-dialog.tsx";

export interface StepActionsProps {
  planId: number;
  step: StoredStep;
  headline: string;
}

/** Done and Skip while a step is open; Undo once acted on. Changes show at once and roll back on failure. */
export function StepActions({ planId, step, headline }: StepActionsProps) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const change = useChangeStepState(planId);
  const [skipping, setSkipping] = useState(false);
  const focusNext = useFocusAfterChange(step.state);

  const act = (input: Omit<ChangeStepStateInput, "stepId">) => {
    focusNext.arm();
    change.mutate({ stepId: step.id, ...input });
  };

  return (
    <div className="mt-4">
      {step.state === "pending" ? (
        <div className="grid grid-cols-2 gap-3">
          <Button ref={focusNext.pendingRef} className="min-h-14 text-lg" onClick={() => act({ state: "done" })}>
            <CheckMark />
            {t("step.done")}
          </Button>
          <Button variant="secondary" className="min-h-14 text-lg" onClick={() => setSkipping(true)}>
            {t("step.skip")}
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-3 rounded-xl bg-pine-50 px-4 py-2">
          <p className="font-bold text-pine-900">
            {step.state === "done" ? (
              <>
                <CheckMark /> {t("step.markedDone")}
              </>
            ) : (
              t("step.markedSkipped")
            )}
            {step.state === "skipped" && step.skipReason && <span className="block font-normal text-ink-soft">“{step.skipReason}”</span>}
          </p>
          <Button ref={focusNext.actedRef} variant="secondary" onClick={() => act({ state: "pending" })}>
            {t("step.undo")}
          </Button>
        </div>
      )}

      {change.isPaused && (
        <p role="status" className="mt-2 text-base text-ink-soft">
          {t("step.waitingForConnection")}
        </p>
      )}
      {change.isError && (
        <p role="alert" className="mt-2 font-semibold text-rust-700">
          {t("step.notSaved", { message: errorText(change.error) })}
        </p>
      )}

      <SkipDialog
        open={skipping}
        stepHeadline={headline}
        onCancel={() => setSkipping(false)}
        onSkip={(reason) => {
          setSkipping(false);
          act({ state: "skipped", reason: reason || undefined });
        }}
      />
    </div>
  );
}

/**
 * Pressing Done removes the Done button; without this, focus would drop to the page top.
 * After the person acts, focus goes to whichever control replaced the one they pressed.
 */
function useFocusAfterChange(state: StoredStep["state"]) {
  const pendingRef = useRef<HTMLButtonElement>(null);
  const actedRef = useRef<HTMLButtonElement>(null);
  const armed = useRef(false);
  useEffect(() => {
    if (!armed.current) return;
    armed.current = false;
    (state === "pending" ? pendingRef : actedRef).current?.focus();
  }, [state]);
  return { pendingRef, actedRef, arm: () => (armed.current = true) };
}

function CheckMark() {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false" className="inline size-5 align-[-3px]" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round">
      <path d="M5 12.5l4.5 4.5L19 7.5" />
    </svg>
  );
}
