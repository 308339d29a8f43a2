/**
 * Runs the local fakes of SMS, e-mail and Google sign-in as one process:
 *   tsx server/fakes/main.ts
 * Settings come from FAKE_* environment variables (see main-config.ts). Development and tests only.
 */

// Checked before anything else is loaded: a fake that accepts any message must never stand in
// for the real services where real customers are waiting for them.
if (process.env.NODE_ENV === "production") {
  console.error(
    "Refusing to start the local fakes: NODE_ENV is 'production'. They imitate Twilio, SMTP and Google sign-in " +
      "for development and tests only; in production configure the real services instead.",
  );
  process.exit(1);
}

const { startFakes } = await import("./index.ts");
const { readFakesEnv, FakesConfigError } = await import("./main-config.ts");

try {
  const fakes = await startFakes(readFakesEnv(process.env));
  console.log(
    [
      "Local fakes are running (development and tests only):",
      `  SMS gateway   ${fakes.smsUrl}  (TWILIO_API_BASE_URL; text the app by hand at ${fakes.smsUrl}/__inbound)`,
      `  SMTP          ${fakes.smtpHost}:${fakes.smtpPort}  (SMTP_HOST / SMTP_PORT)`,
      `  Google OAuth  ${fakes.oauthUrl}  (GOOGLE_AUTH_BASE_URL)`,
      `  Outbox        ${fakes.controlUrl}/__outbox  (FAKES_CONTROL_URL=${fakes.controlUrl})`,
    ].join("\n"),
  );
  let stopping = false;
  const shutdown = async () => {
    if (stopping) return;
    stopping = true;
    await fakes.stop();
    process.exit(0);
  };
  process.on("SIGINT", shutdown);
  process.on("SIGTERM", shutdown);
} catch (error) {
  console.error(error instanceof FakesConfigError ? error.message : `The local fakes could not start: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}

// Makes this file a module, which top-level await needs.
export {};
