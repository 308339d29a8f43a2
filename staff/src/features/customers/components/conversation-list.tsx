import { Link } from "react-router-dom";
import type { CustomerConversation } from "#shared/schemas/customers";

const stamp = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });

/** Each care plan's question-and-answer thread, in numbers, with a way into it. */
export function ConversationList({ conversations, streetOfPlan }: { conversations: CustomerConversation[]; streetOfPlan: (planId: number) => string }) {
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {conversations.map((c) => (
        <li key={c.planId} className="flex flex-col gap-1 rounded-xl border border-line bg-surface p-4">
          <Link to={`/questions/${c.planId}`} className="inline-flex min-h-11 items-center self-start font-semibold">
            Thread on the plan for {streetOfPlan(c.planId)}
          </Link>
          <p>
            {c.messageCount === 1 ? "1 message" : `${c.messageCount} messages`}
            {" · "}
            {c.openQuestions === 0 ? (
              "no open questions"
            ) : (
              <strong className="text-rust-700">{c.openQuestions === 1 ? "1 open question" : `${c.openQuestions} open questions`}</strong>
            )}
          </p>
          <p className="text-base text-ink-soft">{c.lastMessageAt ? `Last message ${stamp.format(new Date(c.lastMessageAt))}` : "No messages yet"}</p>
        </li>
      ))}
    </ul>
  );
}
