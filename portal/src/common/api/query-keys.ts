/**
 * Every portal query key in one place: the step mutation updates several of them at once,
 * and the offline cache decides by the first part which answers are worth keeping.
 */
export const portalKeys = {
  myPlans: ["plans", "mine"] as const,
  plan: (planId: number) => ["plans", planId] as const,
  today: (planId: number) => ["plans", planId, "today"] as const,
  visits: (planId: number) => ["plans", planId, "visits"] as const,
  thread: (planId: number) => ["threads", planId] as const,
  preferences: ["preferences"] as const,
  calendarFeed: ["calendar-feed"] as const,
  company: ["company"] as const,
  unread: ["unread"] as const,
};

/**
 * Answers the portal keeps on the device for offline reading (plus "me", to get past the sign-in check).
 * Not the company profile: the signed-out sign-in page reads it too, so it would be saved again right
 * after a session ends wipes the device (the session still carries the company's name). Not the
 * unread count either: a saved count would still announce answers read since.
 */
export const offlineReadableRoots = new Set(["plans", "threads", "session"]);

/** A week covers the life of a paused phone; older plans would mislead more than help. */
export const offlineMaxAgeMs = 7 * 24 * 60 * 60 * 1000;
