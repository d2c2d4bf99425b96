import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import * as zlib from "node:zlib";
import { describe, expect, it } from "vitest";
import { markDynamicArrays } from "../../src/runner/dynamicarrays";
import { crc32, readZip, writeZip } from "../../src/runner/zip";
import { tempDir, writeBook } from "./support";

describe("the zip reader and writer used to mark dynamic arrays", () => {
  it("computes CRC-32 as Node's zlib does", () => {
    // Reference: node:zlib crc32 (zlib's own CRC-32), and the catalogue check value of
    // CRC-32/ISO-HDLC for "123456789", 0xCBF43926 (from memory).
    expect(crc32(Buffer.from("123456789"))).toBe(0xcbf43926);
    const zcrc = (zlib as unknown as { crc32?: (b: Buffer) => number }).crc32;
    for (let n = 0; n < 20; n++) {
      const b = randomBytes(1 + 97 * n);
      if (zcrc) expect(crc32(b)).toBe(zcrc(b));
    }
  });

  it("writes packages that read back to the same entries, and that zlib can inflate", () => {
    const entries = [
      { name: "a.txt", data: Buffer.from("orbit ".repeat(1000)) },
      { name: "dir/", data: Buffer.alloc(0) },
      { name: "dir/ünïcode.bin", data: randomBytes(5000) },
    ];
    const zip = writeZip(entries);
    expect(readZip(zip)).toEqual(entries);
    expect(writeZip(entries).equals(zip)).toBe(true); // fixed timestamps: same bytes for the same content
  });

  it("reads the packages exceljs writes, and leaves one without ORBIT formulas as it was", async () => {
    const path = await writeBook(join(tempDir(), "plain.xlsx"), { S: { A1: 1, A2: { formula: "A1*2" } } });
    const bytes = readFileSync(path);
    const names = readZip(bytes).map((e) => e.name);
    expect(names).toEqual(expect.arrayContaining(["[Content_Types].xml", "xl/workbook.xml", "xl/worksheets/sheet1.xml"]));
    expect(markDynamicArrays(bytes).equals(bytes)).toBe(true);
  });
});
