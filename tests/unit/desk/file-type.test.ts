import { expect, test } from "vitest";
import { claimedExtension, sniffUploadType } from "~/desk/file-type";

const bytes = (hex: string) => Buffer.from(hex.replace(/\s/g, ""), "hex");

test("file types are read from their signatures, whatever the name says", () => {
  expect(sniffUploadType(bytes("89 50 4e 47 0d 0a 1a 0a 00 00"))).toBe("image/png"); // PNG signature, ISO/IEC 15948 §5.2
  expect(sniffUploadType(bytes("ff d8 ff e0 00 10 4a 46 49 46"))).toBe("image/jpeg"); // JPEG SOI marker FFD8 (ITU-T T.81 B.1.1.3) then APP0
  expect(sniffUploadType(Buffer.from("%PDF-1.7\n"))).toBe("application/pdf"); // ISO 32000-1 §7.5.2 file header
  expect(
    sniffUploadType(
      Buffer.from('<?xml version="1.0"?>\n<!-- drawn by hand -->\n<svg xmlns="http://www.w3.org/2000/svg"/>'),
    ),
  ).toBe("image/svg+xml");
  expect(sniffUploadType(Buffer.from("<html><svg></svg></html>"))).toBeNull();
  expect(sniffUploadType(Buffer.from("GIF89a"))).toBeNull();
});

test("the claimed extension is lower-cased and jpeg counts as jpg", () => {
  expect(claimedExtension("Section.JPEG")).toBe("jpg");
  expect(claimedExtension("drawing.svg")).toBe("svg");
  expect(claimedExtension("no-extension")).toBe("");
});
