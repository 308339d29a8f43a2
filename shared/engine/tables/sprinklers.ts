import type { SourcedRange } from "./provenance.ts";
import { SOURCES } from "./sources.ts";

/** What the crew saw watering the lawn; older inputs leave it out. */
export const SPRINKLER_TYPES = ["fixed_spray", "rotor", "oscillating", "impact"] as const;
export type SprinklerType = (typeof SPRINKLER_TYPES)[number];

export interface SprinklerDefault {
  /** Plain name for homeowner text. */
  readonly name: string;
  /** Typical precipitation rates, in/h. */
  readonly rateInPerHour: SourcedRange;
  /** The rate the plan assumes until a catch-can test: the middle of the range. */
  readonly assumedInPerHour: number;
}

const fromMemory = (name: string, min: number, max: number): SprinklerDefault => ({
  name,
  rateInPerHour: { min, max, source: SOURCES.ifasTexasAmIrrigation, provenance: "from memory" },
  assumedInPerHour: Math.round(((min + max) / 2) * 100) / 100,
});

/*
 * Default precipitation rates when nothing was measured: fixed spray heads
 * about 1.5–2 in/h, rotors about 0.4–0.8 in/h, hose-end oscillating or impact
 * sprinklers about 0.1–0.5 in/h. Recalled, not re-read, so a catch-can test
 * always wins; the middle of each range is assumed until then.
 */
export const SPRINKLER_DEFAULTS: Readonly<Record<SprinklerType, SprinklerDefault>> = {
  fixed_spray: fromMemory("fixed spray heads", 1.5, 2),
  rotor: fromMemory("rotor heads", 0.4, 0.8),
  oscillating: fromMemory("an oscillating hose-end sprinkler", 0.1, 0.5),
  impact: fromMemory("an impact hose-end sprinkler", 0.1, 0.5),
};

/** A hose-end sprinkler of unknown type: both hose-end rows share one range. */
export const HOSE_END_DEFAULT: SprinklerDefault = fromMemory("a hose-end sprinkler", 0.1, 0.5);
