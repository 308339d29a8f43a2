/** Steps and hold-offs name cautions by id; the plan carries the texts once. */
export function cautionTexts(ids: readonly string[], cautions: readonly { id: string; text: string }[]): string[] {
  return ids.map((id) => cautions.find((c) => c.id === id)?.text).filter((text): text is string => Boolean(text));
}
