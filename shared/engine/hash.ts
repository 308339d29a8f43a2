/*
 * A short, stable fingerprint of the normalised input, so the server can tell
 * whether a stored plan still matches its inputs. Not cryptographic: it only
 * has to change when the input changes. Object members are combined with an
 * order-independent sum, so property order in a request does not matter and
 * no keys need sorting; array items keep their order. It runs once per plan
 * on the hot path, hence the allocation-free style: each call leaves its two
 * 32-bit lanes in `lane1` / `lane2`.
 */

let lane1 = 0;
let lane2 = 0;
const float = new Float64Array(1);
const floatWords = new Uint32Array(float.buffer);

/** murmur3 finaliser: spreads every input bit over the whole word. */
function fmix(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

function hashString(s: string, tag: number): void {
  let a = 0x811c9dc5 ^ tag;
  let b = 0x01000193 ^ s.length;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    a = Math.imul(a ^ c, 16777619);
    b = Math.imul(b ^ c, 2246822519);
  }
  lane1 = fmix(a);
  lane2 = fmix(b ^ tag);
}

/*
 * Inputs use the same few dozen member names over and over, so each name's
 * share of the sum (its hash times the lane constant) is worked out once and
 * kept. Bounded: names beyond the table are simply hashed every time.
 */
const MAX_CACHED_KEYS = 1024;
const keySlots = new Map<string, number>();
const keyMix1 = new Int32Array(MAX_CACHED_KEYS + 1);
const keyMix2 = new Int32Array(MAX_CACHED_KEYS + 1);

/** Where the key's mixed hash sits in keyMix1/keyMix2; the last slot is scratch for uncached keys. */
function keySlot(key: string): number {
  const cached = keySlots.get(key);
  if (cached !== undefined) return cached;
  hashString(key, 0x6b);
  const slot = keySlots.size < MAX_CACHED_KEYS ? keySlots.size : MAX_CACHED_KEYS;
  keyMix1[slot] = Math.imul(lane1, 0x9e3779b1);
  keyMix2[slot] = Math.imul(lane2, 0x85ebca6b);
  if (slot < MAX_CACHED_KEYS) keySlots.set(key, slot);
  return slot;
}

function hashValue(v: unknown): void {
  if (v === null || v === undefined) {
    lane1 = 0x6e756c6c;
    lane2 = 0x4e554c4c;
    return;
  }
  switch (typeof v) {
    case "string":
      return hashString(v, 0x73);
    case "number":
      float[0] = v;
      lane1 = fmix((floatWords[0] ?? 0) ^ 0x64);
      lane2 = fmix(Math.imul((floatWords[1] ?? 0) ^ 0x44, 0x9e3779b1));
      return;
    case "boolean":
      lane1 = v ? 0x74727565 : 0x66616c73;
      lane2 = v ? 0x54525545 : 0x46414c53;
      return;
    case "object": {
      if (Array.isArray(v)) {
        let a = 0x5b ^ v.length;
        let b = 0x5d ^ Math.imul(v.length, 0x9e3779b1);
        for (const item of v) {
          hashValue(item);
          a = Math.imul(a ^ lane1, 0x01000193) ^ (a >>> 15);
          b = Math.imul(b ^ lane2, 0x85ebca6b) ^ (b >>> 13);
        }
        lane1 = fmix(a);
        lane2 = fmix(b);
        return;
      }
      const record = v as Record<string, unknown>;
      let sum1 = 0x7b;
      let sum2 = 0x7d;
      for (const key in record) {
        if (!Object.prototype.hasOwnProperty.call(record, key)) continue;
        const item = record[key];
        // An absent key and an undefined one mean the same input.
        if (item === undefined) continue;
        hashValue(item);
        const value1 = lane1;
        const value2 = lane2;
        const slot = keySlot(key);
        sum1 = (sum1 + fmix(value1 ^ (keyMix1[slot] as number))) >>> 0;
        sum2 = (sum2 + fmix(value2 ^ (keyMix2[slot] as number))) >>> 0;
      }
      lane1 = fmix(sum1);
      lane2 = fmix(sum2 ^ 0x2f);
      return;
    }
    default:
      lane1 = 0x3f;
      lane2 = 0x3f3f;
  }
}

/** 53 bits as 14 hex digits. */
export function hashInput(value: unknown): string {
  hashValue(value);
  return (4294967296 * (lane2 & 0x1fffff) + lane1).toString(16).padStart(14, "0");
}
