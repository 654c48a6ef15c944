/** The one writer of every CSV file: rounding, plain decimals, RFC 4180 quoting and the two dialects. */
import assert from "node:assert/strict";
import { CSV_LOCALES, csvNumber, csvTable, csvText } from "../../src/tables/csvTable.ts";
import { readCsv } from "../commands/_csvRead.ts";

Deno.test("csvNumber() rounds to 6 significant figures and writes the shortest plain decimal", () => {
  // Expected texts by hand: round half away from zero at the 6th figure, drop trailing zeros, no exponent.
  const cases: [number, string][] = [
    [24.880000000000003, "24.88"], // 24.88 + 1 ulp, the example of a float artefact
    [0.1 + 0.2, "0.3"],
    [0.20889695019725435, "0.208897"],
    [82269.25, "82269.3"],
    [1234567.8, "1234570"],
    [3.519490254788593e-10, "0.000000000351949"],
    [-1.2e-7, "-0.00000012"],
    [1.23456789e25, "12345700000000000000000000"],
    [-0, "0"],
    [-1e-30, "-0.000000000000000000000000000001"],
    [-4.4713, "-4.4713"],
    [100, "100"],
  ];
  for (const [value, text] of cases) assert.equal(csvNumber(value), text, String(value));
  assert.equal(csvNumber(-0.358337196), "-0.358337");
  assert.equal(csvNumber(-0.358337196, ","), "-0,358337");
  for (const v of [NaN, Infinity, -Infinity]) assert.equal(csvNumber(v), "");
});

Deno.test("a table reads back cell for cell in both dialects, quoted as RFC 4180 says", () => {
  const awkward = ['He said "5,5"; then left', "line one\nline two", "plain", "", "=1+1"];
  const table = csvTable("csv/t.csv", ["name", "value_W"], awkward.map((text, i) => [text, i - 1.5]));
  for (const [name, locale] of Object.entries(CSV_LOCALES)) {
    const read = readCsv(csvText(table, locale), locale.separator);
    assert.deepEqual(read.header, ["name", "value_W"], name);
    // The formula gets the apostrophe of the OWASP guidance; everything else comes back as written.
    assert.deepEqual(read.rows.map((r) => r[0]), [...awkward.slice(0, 4), "'=1+1"], name);
    assert.deepEqual(
      read.rows.map((r) => Number(r[1]!.replace(",", "."))),
      [-1.5, -0.5, 0.5, 1.5, 2.5],
      name,
    );
    assert.equal(read.byteOrderMark, locale.byteOrderMark, name);
  }
  // A null cell is empty; a synthetic-weather comment comes first, on one line.
  const stamped = { ...csvTable("csv/s.csv", ["a_W", "b_W"], [[1, null]]), comment: "SYNTHETIC\nnote" };
  assert.equal(csvText(stamped), "# SYNTHETIC note\na_W,b_W\n1,\n");
  assert.equal(csvText(stamped, CSV_LOCALES["semicolon-comma"]), "\uFEFF# SYNTHETIC note\na_W;b_W\n1;\n");
});
