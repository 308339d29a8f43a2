import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, googleRoundTrip, signInCustomer, signInStaff, waitForMessage, type TestContext } from "../../test/harness.ts";
import { createIsolatedCompany } from "../follow-ups/testing/isolated-company.ts";
import { deactivateStaff } from "./service.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let boss: Agent;
let bossId: number;
let companyId: number;
const tag = Date.now();
const email = (name: string) => `${name}.${tag}@team.example`;

beforeAll(async () => {
  ctx = await createTestContext();
  const made = await createIsolatedCompany(ctx.db, `team-${tag}`, [{ email: email("boss"), role: "manager", name: "Bo Boss" }]);
  companyId = made.companyId;
  bossId = made.staffIds[email("boss")]!;
  boss = await signInStaff(ctx, email("boss"));
});
afterAll(async () => ctx.close());

const sessionsOf = async (userId: number) =>
  Number((await ctx.db("sessions").whereRaw("(sess -> 'passport' ->> 'user') = ?", [String(userId)]).count<{ n: string }[]>({ n: "*" }))[0]!.n);

describe("inviting staff", () => {
  it("adds an active staff member who can then sign in with Google, and e-mails the sign-in page", async () => {
    await ctx.fakes.clearOutbox();
    const res = await boss.post("/api/team/invitations").send({ email: `  ${email("Nell").toUpperCase()} `, role: "technician", name: "Nell Nguyen" }).expect(201);
    expect(res.body).toMatchObject({ invitationSent: true, member: { email: email("nell"), role: "technician", active: true, hasSignedIn: false, invitedByName: "Bo Boss" } });
    const message = await waitForMessage(ctx.fakes, email("nell"));
    expect(message.links.some((l) => l.endsWith("/staff/sign-in"))).toBe(true);

    const nell = await signInStaff(ctx, email("nell"));
    await nell.get("/api/follow-ups").expect(200);
    const team = await boss.get("/api/team").expect(200);
    expect(team.body.members.find((m: { email: string }) => m.email === email("nell"))).toMatchObject({ hasSignedIn: true, name: "Nell Nguyen" });
  });

  it("refuses someone already on the team and an address that belongs to a customer", async () => {
    expect((await boss.post("/api/team/invitations").send({ email: email("nell"), role: "manager" }).expect(409)).body.error.code).toBe("already_member");
    expect((await boss.post("/api/team/invitations").send({ email: "ruth.okonkwo@mail.example", role: "technician" }).expect(409)).body.error.code).toBe("email_taken");
    expect((await boss.post("/api/team/invitations").send({ email: "not-an-address", role: "technician" }).expect(400)).body.error.fields.email).toBeDefined();
    await boss.post("/api/team/invitations").send({ email: email("x"), role: "customer" }).expect(400);
  });

  it("is for managers: technicians and customers get 403", async () => {
    const nell = await signInStaff(ctx, email("nell"));
    await nell.get("/api/team").expect(403);
    await nell.post("/api/team/invitations").send({ email: email("y"), role: "manager" }).expect(403);
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get("/api/team").expect(403);
  });
});

describe("roles and deactivation", () => {
  it("changes a role at once, but never demotes the last manager", async () => {
    const nellId = (await ctx.db("users").where({ email: email("nell") }).first<{ id: number }>("id"))!.id;
    const nell = await signInStaff(ctx, email("nell"));
    await nell.get("/api/team").expect(403);
    await boss.patch(`/api/team/${nellId}`).send({ role: "manager" }).expect(200);
    await nell.get("/api/team").expect(200); // the same session, the new role
    await boss.patch(`/api/team/${nellId}`).send({ role: "technician" }).expect(200);

    const demote = await boss.patch(`/api/team/${bossId}`).send({ role: "technician" }).expect(409);
    expect(demote.body.error).toMatchObject({ code: "last_manager" });
    expect(demote.body.error.message).toMatch(/at least one active manager/);
  });

  it("ends every session of a deactivated person: their next request answers 401", async () => {
    await boss.post("/api/team/invitations").send({ email: email("otto"), role: "technician" }).expect(201);
    const ottoId = (await ctx.db("users").where({ email: email("otto") }).first<{ id: number }>("id"))!.id;
    const phone = await signInStaff(ctx, email("otto"));
    const laptop = await signInStaff(ctx, email("otto"));
    await phone.get("/api/me").expect(200);
    expect(await sessionsOf(ottoId)).toBe(2);

    const res = await boss.post(`/api/team/${ottoId}/deactivate`).expect(200);
    expect(res.body.member).toMatchObject({ active: false });
    expect(res.body.member.deactivatedAt).not.toBeNull();
    expect(await sessionsOf(ottoId)).toBe(0);
    await phone.get("/api/me").expect(401);
    await laptop.get("/api/follow-ups").expect(401);
    // and Google sign-in now says why
    const again = await googleRoundTrip(request.agent(ctx.app), ctx, email("otto"));
    expect(again.location).toBe("/staff/sign-in?error=deactivated");
    // the same request twice changes nothing
    await boss.post(`/api/team/${ottoId}/deactivate`).expect(200);
  });

  it("brings a deactivated person back when invited again", async () => {
    const res = await boss.post("/api/team/invitations").send({ email: email("otto"), role: "manager" }).expect(201);
    expect(res.body.member).toMatchObject({ active: true, role: "manager", deactivatedAt: null });
    const otto = await signInStaff(ctx, email("otto"));
    await otto.get("/api/team").expect(200);
  });

  it("refuses deactivating yourself, and the last manager", async () => {
    // Two managers now (Bo and Otto): Bo may not deactivate Bo.
    const self = await boss.post(`/api/team/${bossId}/deactivate`).expect(409);
    expect(self.body.error.code).toBe("cannot_deactivate_self");

    const ottoId = (await ctx.db("users").where({ email: email("otto") }).first<{ id: number }>("id"))!.id;
    await boss.post(`/api/team/${ottoId}/deactivate`).expect(200);
    // Bo is the only manager left: refused as the last manager, whoever asks.
    const last = await boss.post(`/api/team/${bossId}/deactivate`).expect(409);
    expect(last.body.error.code).toBe("last_manager");
    // Otto's request, had it raced in from another server process after his own deactivation, is refused too.
    const ottoAsCaller = { id: ottoId, companyId, role: "manager" as const, name: "Otto", email: email("otto"), phone: null, customerId: null };
    await expect(deactivateStaff(ctx.db, ottoAsCaller, bossId)).rejects.toMatchObject({ status: 409, code: "last_manager" });
    expect((await ctx.db("users").where({ id: bossId }).first<{ active: boolean }>("active"))!.active).toBe(true);
  });

  it("answers 404 for someone of another company or a customer", async () => {
    const marco = await ctx.db("users").where({ email: "marco@cobblefield.example" }).first<{ id: number }>("id");
    await boss.post(`/api/team/${marco!.id}/deactivate`).expect(404);
    await boss.patch(`/api/team/${marco!.id}`).send({ role: "manager" }).expect(404);
    expect((await ctx.db("users").where({ id: marco!.id }).first<{ active: boolean; role: string }>("active", "role"))).toEqual({ active: true, role: "technician" });
  });
});
