/*
 * What a customer's text asks for. Whole-message keywords, case-insensitive, trailing punctuation
 * ignored ("Stop." and "done!" count). STOP and its synonyms, START and HELP follow the CTIA
 * Messaging Principles (from memory) and the words Twilio's own opt-out handling acts on; DONE is
 * ours: it marks today's watering done.
 */
export type Keyword = "stop" | "start" | "help" | "done";

const KEYWORDS: Record<string, Keyword> = {
  STOP: "stop", STOPALL: "stop", UNSUBSCRIBE: "stop", CANCEL: "stop", END: "stop", QUIT: "stop", REVOKE: "stop", OPTOUT: "stop",
  START: "start", YES: "start", UNSTOP: "start",
  HELP: "help", INFO: "help",
  DONE: "done", WATERED: "done",
};

export function keywordOf(text: string): Keyword | null {
  const word = text.trim().replace(/[\s.!?]+$/, "").toUpperCase().replace(/[\s-]+/g, "");
  return KEYWORDS[word] ?? null;
}
