// Photos in an S3-compatible bucket (S3_BUCKET …) through the official SDK, against s3rver (an S3
// fake from npm) started here on loopback: a submitted photo is stored as an object, not on disk,
// and served back byte for byte with its sniffed type; without S3_BUCKET the local folder is used.
import { existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/requests/route";
import { GET as photo } from "@/app/api/uploads/[id]/route";
import { getDb } from "@/db/client";
import { uploads } from "@/db/schema";
import { stableUuid } from "@/db/seed-data";
import { resetEnvForTests } from "@/lib/env";
import { photoStore } from "@/lib/storage";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { fromClient } from "../helpers/client";
import { tinyJpeg, tinyPng } from "../fixtures/images";

const app = setupTestApp({ seed: true, tempDataDir: true });
const BUCKET = "sagwise-test-photos";
let s3: S3rver;
let s3Dir = "";
const S3_VARS = ["S3_BUCKET", "S3_ENDPOINT", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY", "S3_FORCE_PATH_STYLE"];

beforeAll(async () => {
  s3Dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-s3-"));
  s3 = new S3rver({
    address: "127.0.0.1",
    port: 0,
    silent: true,
    directory: s3Dir,
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  const { port } = await s3.run();
  Object.assign(process.env, {
    S3_BUCKET: BUCKET,
    S3_ENDPOINT: `http://127.0.0.1:${port}`,
    // s3rver's fixed credentials (its README).
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    S3_FORCE_PATH_STYLE: "true",
  });
  resetEnvForTests();
});

afterAll(async () => {
  for (const name of S3_VARS) delete process.env[name];
  resetEnvForTests();
  await s3?.close();
  rmSync(s3Dir, { recursive: true, force: true });
});

const answers = {
  rider: {
    name: "Bucket Rider",
    email: "bucket.rider@example.test",
    weight: { value: 70, unit: "kg" },
    gearIncluded: false,
    skill: "intermediate",
    style: "moderate",
  },
  riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 8 },
  bike: { modelId: stableUuid("bike:mx-450-4t"), year: 2023 },
  feel: { complaints: ["bottoming"] },
  review: { consent: true },
};

async function submitWith(files: Uint8Array[]) {
  const form = new FormData();
  form.set("answers", JSON.stringify(answers));
  files.forEach((bytes, i) => form.append("photos", new File([bytes as BlobPart], `p${i}.img`)));
  const response = await submit(
    new Request(`${ORIGIN()}/api/requests`, { method: "POST", body: form, headers: fromClient() }),
    undefined as never,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return (await response.json()) as { id: string; statusUrl: string };
}

describe("photos in an S3-compatible bucket", () => {
  it("stores each photo as an object and serves it back, byte for byte, with its sniffed type", async () => {
    expect((await photoStore()).kind).toBe("s3");
    const jpeg = tinyJpeg(300);
    const png = tinyPng();
    const { id, statusUrl } = await submitWith([jpeg, png]);
    const token = statusUrl.split("/").pop()!;
    const rows = await (
      await getDb()
    )
      .select()
      .from(uploads)
      .where(eq(uploads.requestId, id))
      .orderBy(uploads.createdAt);
    expect(rows).toHaveLength(2);
    // Nothing on disk: the bucket holds them.
    const local = path.join(app.dataDir, "uploads");
    expect(existsSync(local) ? readdirSync(local) : []).toEqual([]);
    for (const [row, bytes, type] of [
      [rows[0]!, jpeg, "image/jpeg"],
      [rows[1]!, png, "image/png"],
    ] as const) {
      const response = await photo(new Request(`${ORIGIN()}/api/uploads/${row.id}?token=${token}`), {
        params: Promise.resolve({ id: row.id }),
      });
      expect(response.status).toBe(200);
      expect(response.headers.get("content-type")).toBe(type);
      expect(response.headers.get("x-content-type-options")).toBe("nosniff");
      expect(Buffer.compare(Buffer.from(await response.arrayBuffer()), Buffer.from(bytes))).toBe(0);
    }
  });

  it("a photo whose object is gone answers 404, not 500", async () => {
    const { id, statusUrl } = await submitWith([tinyJpeg(64)]);
    const [row] = await (await getDb()).select().from(uploads).where(eq(uploads.requestId, id));
    await (await photoStore()).remove(row!.storageKey);
    const response = await photo(
      new Request(`${ORIGIN()}/api/uploads/${row!.id}?token=${statusUrl.split("/").pop()}`),
      { params: Promise.resolve({ id: row!.id }) },
    );
    expect(response.status).toBe(404);
  });

  it("without S3_BUCKET the local folder is the store again", async () => {
    const saved = process.env.S3_BUCKET;
    delete process.env.S3_BUCKET;
    resetEnvForTests();
    try {
      expect((await photoStore()).kind).toBe("disk");
    } finally {
      process.env.S3_BUCKET = saved;
      resetEnvForTests();
    }
  });
});
