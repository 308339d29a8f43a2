/**
 * Who may reach each API route. Every route in the server's route table must have a row;
 * the test fails on a route without one, so a new route cannot ship without deciding this.
 *
 * "ok"  the request is let through (any answer but 401/403/404 and no 5xx)
 * 401   signed out (or the session ended), 403 wrong role,
 * 404   a customer reaching someone else's record: hidden, not forbidden
 */
export type Outcome = "ok" | 401 | 403 | 404;
export type Caller = "signedOut" | "customerOwn" | "customerOther" | "technician" | "manager" | "deactivated";
export type MatrixRow = Record<Caller, Outcome>;

const publicRoute: MatrixRow = { signedOut: "ok", customerOwn: "ok", customerOther: "ok", technician: "ok", manager: "ok", deactivated: "ok" };
const staffOnly: MatrixRow = { signedOut: 401, customerOwn: 403, customerOther: 403, technician: "ok", manager: "ok", deactivated: 401 };
const managerOnly: MatrixRow = { signedOut: 401, customerOwn: 403, customerOther: 403, technician: 403, manager: "ok", deactivated: 401 };
const customerOnly: MatrixRow = { signedOut: 401, customerOwn: "ok", customerOther: "ok", technician: 403, manager: 403, deactivated: 401 };
const anyoneSignedIn: MatrixRow = { signedOut: 401, customerOwn: "ok", customerOther: "ok", technician: "ok", manager: "ok", deactivated: 401 };
/** A customer's own record, or any record of the company for staff. */
const ownRecordOrStaff: MatrixRow = { signedOut: 401, customerOwn: "ok", customerOther: 404, technician: "ok", manager: "ok", deactivated: 401 };
/** Reached by a secret token in the URL, never by a session: a made-up token is not found for anyone. */
const feedByToken: MatrixRow = { signedOut: 404, customerOwn: 404, customerOther: 404, technician: 404, manager: 404, deactivated: 404 };
/** Webhooks prove themselves with the provider's signature; no session helps, none is needed. */
const signedWebhook: MatrixRow = { signedOut: 403, customerOwn: 403, customerOther: 403, technician: 403, manager: 403, deactivated: 403 };
/** Only the customer who owns the record. */
const ownRecordOnly: MatrixRow = { signedOut: 401, customerOwn: "ok", customerOther: 404, technician: 403, manager: 403, deactivated: 401 };

export const authorizationMatrix: Record<string, MatrixRow> = {
  "GET /api/health": publicRoute,
  "GET /api/company": publicRoute,
  "PATCH /api/company": managerOnly,
  "POST /api/company/logo": managerOnly,
  // E-mails and the printed plan show the logo with no session (the matrix test uploads one first).
  "GET /api/companies/:companyId/logo": publicRoute,
  "GET /api/my/unread": customerOnly,
  "GET /api/me": anyoneSignedIn,
  "POST /api/auth/link": publicRoute,
  "POST /api/auth/link/consume": publicRoute,
  "POST /api/auth/sign-out": publicRoute,
  // Ends the caller's own sessions only; there is nobody else's record to reach.
  "POST /api/auth/sign-out-everywhere": anyoneSignedIn,
  "GET /api/dev/outbox": staffOnly,
  "GET /api/my/properties": customerOnly,
  "GET /api/properties/:id": ownRecordOrStaff,
  "POST /api/plans/preview": staffOnly,
  "GET /api/programs/current": staffOnly,
  "GET /api/my/plans": customerOnly,
  "GET /api/plans/:planId": ownRecordOrStaff,
  "GET /api/plans/:planId/today": ownRecordOrStaff,
  "PUT /api/plans/:planId/steps/:stepId/state": ownRecordOrStaff,
  "POST /api/plans/:planId/observations": ownRecordOrStaff,
  "POST /api/plans/:planId/regenerate": staffOnly,
  "POST /api/visits": staffOnly,
  "PATCH /api/visits/:id": staffOnly,
  "GET /api/audit": managerOnly,
  "POST /api/programs": managerOnly,
  "GET /api/place-rules": staffOnly,
  "POST /api/place-rules": managerOnly,
  "PUT /api/place-rules/:id": managerOnly,
  "DELETE /api/place-rules/:id": managerOnly,
  "GET /api/reminders/failed": staffOnly,
  "GET /api/my/preferences": customerOnly,
  "PUT /api/my/preferences": customerOnly,
  "POST /api/my/contact": customerOnly,
  // Links from messages: the token in the link is the proof (400 without one).
  "GET /api/my/contact/confirm": publicRoute,
  "POST /api/my/contact/confirm": publicRoute,
  "GET /api/unsubscribe/email": publicRoute,
  "POST /api/unsubscribe/email": publicRoute,
  "POST /api/webhooks/sms/inbound": signedWebhook,
  "POST /api/webhooks/sms/status": signedWebhook,
  "GET /api/unmatched-inbound": managerOnly,
  "POST /api/unmatched-inbound/:id/handled": managerOnly,
  "GET /api/questions/open": staffOnly,
  "GET /api/questions/answered": staffOnly,
  "POST /api/questions/:messageId/assign": staffOnly,
  "GET /api/plans/:planId/thread": ownRecordOrStaff,
  "POST /api/plans/:planId/questions": ownRecordOnly,
  "POST /api/plans/:planId/answers": staffOnly,
  "GET /api/photos/:id/:size": ownRecordOrStaff,
  "GET /api/my/calendar": customerOnly,
  "POST /api/my/calendar/rotate": customerOnly,
  "GET /calendar/:file": feedByToken,
  "GET /calendar": feedByToken,
  "GET /api/follow-ups": staffOnly,
  "GET /api/follow-ups.csv": staffOnly,
  "GET /api/follow-ups/:id": staffOnly,
  "POST /api/follow-ups": staffOnly,
  "PATCH /api/follow-ups/:id": staffOnly,
  "GET /api/plans/:planId/visits": ownRecordOrStaff,
  "POST /api/follow-ups/:id/confirm": ownRecordOnly,
  "POST /api/follow-ups/:id/another-day": ownRecordOnly,
  "GET /api/reports/callbacks": managerOnly,
  "GET /api/team": managerOnly,
  "POST /api/team/invitations": managerOnly,
  "PATCH /api/team/:userId": managerOnly,
  "POST /api/team/:userId/deactivate": managerOnly,
  "GET /api/saved-replies": staffOnly,
  "POST /api/saved-replies": managerOnly,
  "PUT /api/saved-replies/:id": managerOnly,
  "DELETE /api/saved-replies/:id": managerOnly,
  "POST /api/saved-replies/:id/render": staffOnly,
  "GET /api/customers": staffOnly,
  "GET /api/customers/:id": staffOnly,
  "GET /api/staff/day": staffOnly,
  "GET /api/plans/:planId/homeowner-view": staffOnly,
  "GET /api/visit-imports/template.csv": managerOnly,
  "POST /api/visit-imports/preview": managerOnly,
  "POST /api/visit-imports": managerOnly,
  "GET /api/visit-imports/:batchId": managerOnly,
};

export const matrixKinds = { signedWebhook, feedByToken, publicRoute, staffOnly, managerOnly, customerOnly, anyoneSignedIn, ownRecordOrStaff, ownRecordOnly };
