import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import sharp from "sharp";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { publicCompanyResponseSchema } from "#shared/schemas/company";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { jpegWithGps, smallPng } from "../photos/testing/images.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let photoDir: string;
let dana: Agent;
let marco: Agent;
let ruth: Agent;
let companyId: number;

async function company(agent: Agent | ReturnType<typeof request>) {
  const res = await (agent as Agent).get("/api/company").expect(200);
  return publicCompanyResponseSchema.parse(res.body).company;
}

async function storedFiles(): Promise<string[]> {
  const entries = await readdir(photoDir, { recursive: true, withFileTypes: true });
  return entries.filter((e) => e.isFile()).map((e) => join(e.parentPath, e.name));
}

beforeAll(async () => {
  photoDir = await mkdtemp(join(tmpdir(), "sproutline-logo-"));
  ctx = await createTestContext({ PHOTO_DIR: photoDir });
  dana = await signInStaff(ctx, "dana@cobblefield.example");
  marco = await signInStaff(ctx, "marco@cobblefield.example");
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  companyId = (await company(dana)).id;
  await ctx.db("companies").where({ id: companyId }).update({ logo_key: null, logo_updated_at: null });
});

afterAll(async () => {
  await ctx.close();
  await rm(photoDir, { recursive: true, force: true });
});

describe("the company's office phone", () => {
  it("is set by a manager, read as a North American number and stored in E.164", async () => {
    const res = await dana.patch("/api/company").send({ phone: "(330) 555-0100" }).expect(200);
    expect(publicCompanyResponseSchema.parse(res.body).company.phone).toBe("+13305550100");
    expect((await company(ruth)).phone).toBe("+13305550100");
    expect((await company(request(ctx.app))).phone).toBe("+13305550100");
  });

  it("refuses something that is not a phone number, with a field error, and keeps the old one", async () => {
    const res = await dana.patch("/api/company").send({ phone: "555-0100" }).expect(400);
    expect(res.body.error.fields).toHaveProperty("phone");
    await dana.patch("/api/company").send({ phone: "call the office" }).expect(400);
    expect((await company(dana)).phone).toBe("+13305550100");
  });

  it("can be cleared", async () => {
    await dana.patch("/api/company").send({ phone: "" }).expect(200);
    expect((await company(dana)).phone).toBeNull();
    await dana.patch("/api/company").send({ phone: "+1 330 555 0100" }).expect(200);
  });

  it("is changed by managers only", async () => {
    await marco.patch("/api/company").send({ phone: "+13305550199" }).expect(403);
    await ruth.patch("/api/company").send({ phone: "+13305550199" }).expect(403);
    await request(ctx.app).patch("/api/company").send({ phone: "+13305550199" }).expect(401);
    expect((await company(dana)).phone).toBe("+13305550100");
  });
});

describe("the company's logo", () => {
  it("answers 404 while none is uploaded", async () => {
    expect((await company(ruth)).logoUrl).toBeNull();
    await request(ctx.app).get(`/api/companies/${companyId}/logo`).expect(404);
  });

  it("refuses a text file renamed .png and stores nothing", async () => {
    const res = await dana.post("/api/company/logo").attach("logo", Buffer.from("Cobblefield Turf Care\nnot an image at all\n"), { filename: "logo.png", contentType: "image/png" }).expect(415);
    expect(res.body.error.code).toBe("unsupported_type");
    expect(await storedFiles()).toEqual([]);
    expect((await company(dana)).logoUrl).toBeNull();
  });

  it("refuses a request without a file", async () => {
    await dana.post("/api/company/logo").expect(400);
  });

  it("is re-encoded to a bounded PNG without metadata and served publicly with the right headers", async () => {
    const res = await dana.post("/api/company/logo").attach("logo", await jpegWithGps(3000, 2000), "logo.jpg").expect(200);
    const logoUrl = publicCompanyResponseSchema.parse(res.body).company.logoUrl;
    expect(logoUrl).toMatch(new RegExp(`^/api/companies/${companyId}/logo\\?v=\\d+$`));
    expect((await company(ruth)).logoUrl).toBe(logoUrl);

    const served = await request(ctx.app).get(logoUrl!).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => done(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(served.headers["content-type"]).toBe("image/png");
    expect(served.headers["cache-control"]).toMatch(/^public, max-age=\d+/);
    expect(served.headers["x-content-type-options"]).toBe("nosniff");
    const meta = await sharp(served.body as Buffer).metadata();
    expect(meta.format).toBe("png");
    expect(Math.max(meta.width!, meta.height!)).toBe(512);
    expect(meta.exif).toBeUndefined();
    expect(await storedFiles()).toHaveLength(1);
  });

  it("replaces the previous file when a new logo is uploaded, under a new URL", async () => {
    const before = (await company(dana)).logoUrl;
    const small = await smallPng();
    const res = await dana.post("/api/company/logo").attach("logo", small, "new-logo.png").expect(200);
    const after = publicCompanyResponseSchema.parse(res.body).company.logoUrl;
    expect(after).not.toBe(before);
    // A small logo is kept at its own size, not blown up.
    const served = await request(ctx.app).get(after!).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => done(null, Buffer.concat(chunks)));
    }).expect(200);
    const meta = await sharp(served.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([512, 384]);
    expect(await storedFiles()).toHaveLength(1);
  });

  it("is uploaded by managers only", async () => {
    const png = await smallPng();
    await marco.post("/api/company/logo").attach("logo", png, "logo.png").expect(403);
    await ruth.post("/api/company/logo").attach("logo", png, "logo.png").expect(403);
    await request(ctx.app).post("/api/company/logo").attach("logo", png, "logo.png").expect(401);
  });

  it("answers 404 for a company that does not exist", async () => {
    await request(ctx.app).get("/api/companies/999999/logo").expect(404);
  });
});
