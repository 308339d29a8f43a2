/**
 * How sure we are of a number, so the "why?" screen and the tests can say so:
 * - published: read from a named publication or standard;
 * - common practice: a rule of thumb of the trade with no single source;
 * - from memory: recalled from a named kind of publication, not re-read.
 */
export type Provenance = "published" | "common practice" | "from memory";

export interface Sourced {
  readonly source: string;
  readonly provenance: Provenance;
}

/** A numeric range with where it came from. */
export interface SourcedRange extends Sourced {
  readonly min: number;
  readonly max: number;
}

/** The homeowner-facing reason behind a step, hold-off or warning. */
export interface Why extends Sourced {
  readonly text: string;
}
