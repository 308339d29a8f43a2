/**
 * Loopback ports and database names. One set for running the product and one for tests,
 * so both can run at once; SPROUTLINE_PORT_BASE and SPROUTLINE_DB_SUFFIX give a second
 * working copy (or a second developer on the machine) a set of its own.
 */
export const postgresPort = 54329;

export type StackPorts = { app: number; sms: number; oauth: number; smtp: number; inboundSmtp: number };

const portsFrom = (base: number): StackPorts => ({ app: base, sms: base + 1, oauth: base + 2, smtp: base + 3, inboundSmtp: base + 4 });
const envBase = Number(process.env.SPROUTLINE_PORT_BASE);
const base = Number.isInteger(envBase) && envBase > 1024 ? envBase : 5180;

export const runPorts: StackPorts = portsFrom(base);
export const testPorts: StackPorts = portsFrom(base + 10);

const suffix = (process.env.SPROUTLINE_DB_SUFFIX ?? "").replace(/[^a-z0-9_]/g, "");
export const databases = {
  run: `sproutline${suffix}`,
  apiTests: `sproutline_test${suffix}`,
  browserTests: `sproutline_e2e${suffix}`,
} as const;
