/**
 * Where photo bytes live. Local disk by default; an S3-compatible adapter can implement the
 * same three calls. Keys are made by the server (random), never from a client's file name.
 */
export interface PhotoStorage {
  put(key: string, data: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or undefined when nothing is stored under the key. */
  get(key: string): Promise<Buffer | undefined>;
  /** Removes the object; removing a missing key is not an error (clean-up may run twice). */
  delete(key: string): Promise<void>;
}

/** Lower-case letters, digits, dashes and single slashes between segments: no "..", no absolute paths. */
const KEY_PATTERN = /^[a-z0-9][a-z0-9-]*(\/[a-z0-9][a-z0-9.-]*)*$/;

export function assertValidKey(key: string): void {
  if (!KEY_PATTERN.test(key) || key.includes("..") || key.length > 200) {
    throw new Error(`invalid storage key: ${JSON.stringify(key)}`);
  }
}
