import type { PhotoRef, ThreadMessage } from "#shared/schemas/questions";

export interface ThreadParts {
  /** The questions waiting for an answer (asked after the last answer); else the latest question. */
  focus: ThreadMessage[];
  /** True when the focus questions already have an answer after them. */
  answered: boolean;
  /** Everything before the focus questions, oldest first. */
  earlier: ThreadMessage[];
  /** Everything after the focus questions (answers, notes). */
  later: ThreadMessage[];
  customerName: string | null;
}

/** Splits a plan's thread around the question a technician is here to answer. */
export function splitThread(messages: readonly ThreadMessage[]): ThreadParts {
  const lastAnswer = messages.findLastIndex((m) => m.kind === "answer");
  const waiting = messages.filter((m, i) => m.kind === "question" && i > lastAnswer);
  const customerName = messages.find((m) => m.authorRole === "customer")?.authorName ?? null;
  if (waiting.length > 0) {
    const first = messages.indexOf(waiting[0]!);
    return { focus: waiting, answered: false, earlier: messages.slice(0, first), later: messages.slice(first).filter((m) => !waiting.includes(m)), customerName };
  }
  const lastQuestion = messages.findLastIndex((m) => m.kind === "question");
  if (lastQuestion === -1) return { focus: [], answered: false, earlier: [...messages], later: [], customerName };
  return { focus: [messages[lastQuestion]!], answered: true, earlier: messages.slice(0, lastQuestion), later: messages.slice(lastQuestion + 1), customerName };
}

export interface DatedPhoto {
  photo: PhotoRef;
  takenAt: string;
  /** Which message it came with, for the alt text: "Ruth's question". */
  from: string;
}

/** Photos the homeowner sent, newest first: the lawn's history for comparison. */
export function customerPhotos(messages: readonly ThreadMessage[]): DatedPhoto[] {
  return messages
    .filter((m) => m.authorRole === "customer")
    .flatMap((m) => m.photos.map((photo) => ({ photo, takenAt: m.createdAt, from: m.kind === "question" ? "question" : "check-in" })))
    .reverse();
}
