import { useState } from "react";
import { Link, useParams } from "react-router-dom";
import { ErrorState, LoadingState, NotFoundPage, Notice, Page } from "#shared/ui/index";
import { usePlan } from "../../common/api/get-plan.ts";
import { useThread } from "./api/get-thread.ts";
import { AnswerForm } from "./components/answer-form.tsx";
import { ConversationMessages } from "./components/earlier-conversation.tsx";
import { FollowUpBooking } from "./components/follow-up-booking.tsx";
import { PhotoCompare } from "./components/photo-compare.tsx";
import { PhotoDialog } from "./components/photo-dialog.tsx";
import { PlanSummary } from "./components/plan-summary.tsx";
import { QuestionCard } from "./components/question-card.tsx";
import { AssignQuestion } from "./components/assign-question.tsx";
import type { PhotoViewing } from "./lib/photo-viewing.ts";
import { customerPhotos, splitThread } from "./lib/thread-parts.ts";

/** One plan's question, opened from the queue: /questions/:planId (each plan has one thread). */
export function QuestionDetailRoute() {
  const planId = Number(useParams().planId);
  if (!Number.isInteger(planId) || planId <= 0) return <NotFoundPage />;
  return <QuestionDetail planId={planId} />;
}

function QuestionDetail({ planId }: { planId: number }) {
  const thread = useThread(planId);
  const plan = usePlan(planId);
  const [viewing, setViewing] = useState<PhotoViewing | null>(null);

  const parts = thread.data ? splitThread(thread.data.messages) : null;
  const name = parts?.customerName ?? null;
  const title = name ? `Question from ${name}` : "Question";

  const back = (
    <Link to="/questions" className="inline-flex min-h-11 items-center font-semibold">
      ← Question queue
    </Link>
  );

  if (thread.isError || plan.isError) {
    return (
      <Page title="Question" intro={back} width="wide">
        <ErrorState title="This question didn't load" error={thread.error ?? plan.error} onRetry={() => void Promise.all([thread.refetch(), plan.refetch()])} />
      </Page>
    );
  }
  if (!parts || !plan.data) {
    return (
      <Page title="Question" intro={back} width="wide">
        <LoadingState label="Loading the question…" />
      </Page>
    );
  }

  const currentPhotos = customerPhotos(parts.focus);
  const earlierPhotos = customerPhotos(parts.earlier);
  const latestQuestion = parts.focus[parts.focus.length - 1];

  return (
    <Page title={title} intro={back} width="wide">
      <div className="flex flex-col gap-5">
        <PlanSummary plan={plan.data} />
        <div className="grid gap-5 lg:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)] lg:items-start">
          <div className="flex min-w-0 flex-col gap-5">
            {parts.focus.length === 0 && <Notice title="No question on this plan yet">The homeowner hasn't asked anything. You can still write to them below.</Notice>}
            {parts.answered && <Notice tone="success" title="This question has an answer">The latest answer is under “Since this question”.</Notice>}
            {parts.focus.map((message) => (
              <QuestionCard key={message.id} message={message} onOpenPhoto={setViewing} />
            ))}
            {latestQuestion && latestQuestion.id > 0 && <AssignQuestion messageId={latestQuestion.id} />}
            <ConversationMessages title="Since this question" messages={parts.later} onOpenPhoto={setViewing} open />
            <PhotoCompare current={currentPhotos} earlier={earlierPhotos} onOpenPhoto={setViewing} />
            <ConversationMessages title="Earlier conversation" messages={parts.earlier} onOpenPhoto={setViewing} />
          </div>
          <div className="flex min-w-0 flex-col gap-5">
            <AnswerForm planId={planId} customerFirstName={name?.split(/\s+/)[0] ?? null} />
            <FollowUpBooking context={{ propertyId: plan.data.propertyId, planId, questionMessageId: latestQuestion && latestQuestion.id > 0 ? latestQuestion.id : undefined }} />
          </div>
        </div>
      </div>
      <PhotoDialog photo={viewing?.photo ?? null} alt={viewing?.alt ?? ""} caption={viewing?.caption ?? ""} onClose={() => setViewing(null)} />
    </Page>
  );
}
