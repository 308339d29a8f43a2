import { describe, expect, it } from "vitest";
import { batchedReads } from "./batched-reads.ts";

/** A reader that records each batch it is asked for and answers "value of <key>". */
function recordingReader() {
  const batches: number[][] = [];
  const reads = batchedReads<number, string>(async (keys) => {
    batches.push([...keys]);
    return keys.map((k) => (k < 0 ? undefined : `value of ${k}`));
  });
  return { reads, batches };
}

describe("reads batched across concurrent requests", () => {
  it("answers reads asked for at the same moment with one batch, each its own value, duplicates and misses included", async () => {
    const { reads, batches } = recordingReader();
    const answers = await Promise.all([3, 1, 3, -7, 2].map((k) => reads.load(k)));
    expect(answers).toEqual(["value of 3", "value of 1", "value of 3", undefined, "value of 2"]);
    expect(batches).toEqual([[3, 1, 3, -7, 2]]);
  });

  it("joins reads started by separate I/O callbacks of one turn, as requests from many sockets are", async () => {
    const { reads, batches } = recordingReader();
    // Two callbacks queued for one phase of the event loop, each its own callback, like two sockets' data.
    // (Immediates rather than timers: two 1 ms timers land in different turns when the clock ticks between them.)
    const asked = await new Promise<Promise<string | undefined>[]>((done) => {
      const loads: Promise<string | undefined>[] = [];
      setImmediate(() => loads.push(reads.load(1)));
      setImmediate(() => {
        loads.push(reads.load(2));
        done(loads);
      });
    });
    await Promise.all(asked);
    expect(batches).toEqual([[1, 2]]);
  });

  it("reads again for a later request instead of answering from memory", async () => {
    const { reads, batches } = recordingReader();
    await reads.load(5);
    await reads.load(5);
    expect(batches).toEqual([[5], [5]]);
  });

  it("fails every read of a batch whose query fails, so each request can answer with an error", async () => {
    const reads = batchedReads<number, string>(async () => {
      throw new Error("database unavailable");
    });
    const results = await Promise.allSettled([reads.load(1), reads.load(2)]);
    expect(results.map((r) => r.status)).toEqual(["rejected", "rejected"]);
  });
});
