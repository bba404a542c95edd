import { describe, expect, it } from "vitest";
import { sniffAttachmentType } from "@/app/_server/storage/sniff";
import { tinyPng } from "../../../support/png";

describe("sniffAttachmentType", () => {
  it("recognises PNG, JPEG and PDF by their signatures", () => {
    expect(sniffAttachmentType(tinyPng())).toBe("image/png");
    expect(sniffAttachmentType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))).toBe("image/jpeg");
    expect(sniffAttachmentType(Buffer.from("%PDF-1.5\n%âãÏÓ\n", "latin1"))).toBe("application/pdf");
  });

  it("takes plain UTF-8 text as CSV", () => {
    expect(sniffAttachmentType(Buffer.from("r,V_eff\n6,−0.0555\n"))).toBe("text/csv");
  });

  it("refuses executables, scripts, markup and empty files", () => {
    expect(sniffAttachmentType(Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, 0, 0]))).toBeNull(); // ELF
    expect(sniffAttachmentType(Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00]))).toBeNull(); // Windows "MZ"
    expect(sniffAttachmentType(Buffer.from("#!/bin/sh\nrm -rf /\n"))).toBeNull();
    expect(sniffAttachmentType(Buffer.from("<svg onload=alert(1)>"))).toBeNull();
    expect(sniffAttachmentType(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]))).toBeNull(); // zip
    expect(sniffAttachmentType(new Uint8Array())).toBeNull();
  });
});
