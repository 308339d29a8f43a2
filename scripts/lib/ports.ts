/** Fixed loopback ports, one set for running the product and one for tests, so both can run at once. */
export const postgresPort = 54329;

export type StackPorts = { app: number; sms: number; oauth: number; smtp: number };
export const runPorts: StackPorts = { app: 5180, sms: 5181, oauth: 5182, smtp: 2525 };
export const testPorts: StackPorts = { app: 5190, sms: 5191, oauth: 5192, smtp: 2535 };

export const databases = { run: "sproutline", apiTests: "sproutline_test", browserTests: "sproutline_e2e" } as const;
