// Photos are judged by their bytes: the format's own signature (PNG spec, JFIF, ISO-BMFF brand),
// never the name or the browser's type.
import { describe, expect, it } from "vitest";
import { checkPhotos, displayName, MAX_PHOTO_BYTES, PhotoError } from "@/lib/storage/photos";
import { heicHeader, pdfBytes, tinyJpeg, tinyPng } from "../fixtures/images";

const refused = async (photos: { originalName: string; bytes: Uint8Array }[]) => {
  try {
    await checkPhotos(photos);
  } catch (error) {
    if (error instanceof PhotoError) return { field: error.field, message: error.message, status: error.status };
    throw error;
  }
  throw new Error("accepted");
};

describe("checkPhotos", () => {
  it("takes the type from the content: a PNG named .jpg is a PNG", async () => {
    const [png, jpeg] = await checkPhotos([
      { originalName: "bike.jpg", bytes: tinyPng() },
      { originalName: "x", bytes: tinyJpeg() },
    ]);
    expect([png!.contentType, png!.ext, jpeg!.contentType, jpeg!.ext]).toEqual([
      "image/png",
      "png",
      "image/jpeg",
      "jpg",
    ]);
  });
  it("refuses text, PDF and HEIC with a message naming the file", async () => {
    expect(
      await refused([{ originalName: "a.jpg", bytes: new TextEncoder().encode("not an image at all") }]),
    ).toMatchObject({ field: "photos.0", status: 400, message: "“a.jpg” is not a JPEG, PNG or WebP photo." });
    expect(
      await refused([
        { originalName: "ok.png", bytes: tinyPng() },
        { originalName: "b.png", bytes: pdfBytes() },
      ]),
    ).toMatchObject({ field: "photos.1" });
    expect((await refused([{ originalName: "IMG.HEIC", bytes: heicHeader() }])).message).toMatch(/HEIC photo.*JPEG/);
  });
  it("refuses a photo one byte over 10 MB (413) and more than 6 photos", async () => {
    expect(MAX_PHOTO_BYTES).toBe(10 * 1024 * 1024);
    expect(await refused([{ originalName: "big.jpg", bytes: tinyJpeg(MAX_PHOTO_BYTES + 1) }])).toMatchObject({
      status: 413,
      message: "“big.jpg” is 10.0 MB; each photo may be at most 10 MB.",
    });
    await expect(checkPhotos([{ originalName: "edge.jpg", bytes: tinyJpeg(MAX_PHOTO_BYTES) }])).resolves.toHaveLength(
      1,
    );
    expect((await refused(Array.from({ length: 7 }, () => ({ originalName: "p.png", bytes: tinyPng() })))).field).toBe(
      "photos",
    );
  });
  it("keeps names as harmless display text", () => {
    expect(displayName("a\u0000b\nc.jpg")).toBe("abc.jpg");
    expect(displayName("   ")).toBe("photo");
  });
});
