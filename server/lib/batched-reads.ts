import DataLoader from "dataloader";

/**
 * Batches one kind of read across concurrent requests: every key asked for while the server
 * handles one burst of incoming requests goes to the database in a single query. Under load
 * each round trip to PostgreSQL costs more than the work inside it, so a hundred homeowners
 * opening Today at once cost a few queries, not a hundred. Nothing is cached: each key is read
 * as the database holds it at that moment, so a change (a deactivation, a ticked step) counts
 * from the next request, exactly as with one query per request.
 *
 * `readMany` gets the keys in order, duplicates included, and answers one value (or undefined)
 * per key, in the same order.
 */
export function batchedReads<K, V>(readMany: (keys: readonly K[]) => Promise<(V | undefined)[]>): DataLoader<K, V | undefined> {
  return new DataLoader<K, V | undefined>(readMany, {
    cache: false,
    maxBatchSize: 200,
    // After the poll phase, so requests parsed from all sockets that were ready join one batch
    // (DataLoader's default, the end of the current tick, only gathers one socket's requests).
    batchScheduleFn: (run) => setImmediate(run),
  });
}
