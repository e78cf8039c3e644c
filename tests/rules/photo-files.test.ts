import { describe, expect, it } from "vitest";
import { MAX_PHOTO_BYTES, photoRefusal, refusalMessage } from "../../lib/photo-files";

describe("which files are taken as photos", () => {
  it("takes the photo types by their type, or by their name when the type is unknown", () => {
    for (const type of ["image/jpeg", "image/png", "image/webp", "image/heic", "IMAGE/HEIF"])
      expect(photoRefusal({ name: "a", type, size: 1000 })).toBeUndefined();
    expect(photoRefusal({ name: "IMG_0001.HEIC", type: "" })).toBeUndefined();
    expect(photoRefusal({ name: "plate.jpeg", type: null })).toBeUndefined();
  });

  it("refuses other types whatever their name says", () => {
    expect(photoRefusal({ name: "log.pdf", type: "application/pdf" })).toBe("type");
    expect(photoRefusal({ name: "photo.jpg", type: "application/pdf" })).toBe("type");
    expect(photoRefusal({ name: "anim.gif", type: "image/gif" })).toBe("type");
    expect(photoRefusal({ name: "notes", type: "" })).toBe("type");
  });

  it("refuses a file over 15 MB, unless the size is left for after shrinking", () => {
    const big = { name: "big.jpg", type: "image/jpeg", size: MAX_PHOTO_BYTES + 1 };
    expect(photoRefusal(big)).toBe("size");
    expect(photoRefusal(big, { checkSize: false })).toBeUndefined();
    expect(photoRefusal({ ...big, size: MAX_PHOTO_BYTES })).toBeUndefined();
  });

  it("words each refusal once, naming the file when its name is known", () => {
    expect(refusalMessage("type", "log.pdf")).toBe(
      "“log.pdf” is not a photo we can read. Send a JPEG, PNG, WebP or HEIC picture.",
    );
    expect(refusalMessage("type")).toMatch(/^That file is not a photo/);
    expect(refusalMessage("size", "big.jpg")).toMatch(/^“big\.jpg” is larger than 15 MB/);
  });
});
