import { demoCustomers, demoStaff } from "../../seeds/data/demo-company.ts";
import type { RunningStack } from "./stack.ts";

export function printBanner(stack: RunningStack, title: string) {
  const customer = demoCustomers[0]!;
  const lines = [
    "",
    `  ${title}`,
    "",
    `  Homeowner portal   ${stack.appUrl}/portal/`,
    `  Staff app          ${stack.appUrl}/staff/`,
    `  Outbox (messages)  ${stack.appUrl}/staff/outbox   (sign in as staff first)`,
    "",
    "  Demo sign-ins",
    `    Homeowner: ask for a link with ${customer.email} (or ${customer.phone}),`,
    "               then open it from the staff Outbox.",
    ...demoStaff.map((s) => `    ${s.role === "manager" ? "Manager:   " : "Technician:"} ${s.name} <${s.email}> on the local Google sign-in page`),
    "",
    "  Press Ctrl-C to stop everything that was started (PostgreSQL included).",
    "",
  ];
  process.stdout.write(lines.join("\n") + "\n");
}

/** Stops the stack once on Ctrl-C or SIGTERM, then exits. */
export function stopOnSignal(stack: { stop(): Promise<void> }) {
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    process.stdout.write(`\n${signal} received: stopping…\n`);
    await stack.stop();
    process.exit(0);
  };
  process.on("SIGINT", () => void stop("SIGINT"));
  process.on("SIGTERM", () => void stop("SIGTERM"));
}
