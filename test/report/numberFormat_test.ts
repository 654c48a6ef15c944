/**
 * One number format in the whole package (ISSUE 11, item 9): three significant figures, very small and very
 * large numbers as "1.11 × 10⁻²" with superscript digits, never "1.1111e-2" or "24.880000000000003". The demo
 * (projects/demo) is built in SI and in IP and the text a reader sees is scanned: cover, summary, body and
 * appendices, plots and drawings included. Left out: the user's own text (prose and input blocks, the raw
 * inputs of Appendix A), the embedded results.json (Appendix B), the tables of dynamic factors (Appendix D,
 * which state their digits), the exact unit definitions of an IP package, hashes, and the coefficients of a
 * formula quoted in an assumption (610.5·exp(17.269θ/(237.3+θ)), ISO 13788 as written).
 */
import assert from "node:assert/strict";
import { IP_DISPLAY, SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { PA_PER_IN_HG, quotedNumbers } from "../../src/report/page/quotedText.ts";
import { demoPackage } from "./demoBuild.ts";
import { parseDocument } from "./dom.ts";

const demo = async (units: "SI" | "IP") => parseDocument(await Deno.readTextFile(await demoPackage(units)));

/** What is not the package's own number output (see the module comment). */
const NOT_SCANNED = [
  "style",
  "pre",
  ".prose",
  ".input-block",
  ".block-as-written",
  "tr.unit-definitions",
  ".hash",
  "#s-a",
  "#s-b",
  "#s-d",
];

function shownText(doc: Document): string {
  for (const selector of NOT_SCANNED) {
    for (const el of Array.from(doc.querySelectorAll(selector))) el.remove();
  }
  const parts: string[] = [];
  const walk = (node: Node) => {
    if (node.nodeType === 3) parts.push(node.textContent ?? "");
    for (const child of Array.from(node.childNodes)) walk(child);
  };
  walk(doc.body);
  // Text nodes joined by a space: adjacent table cells never run together into one number.
  return parts.join(" ").replace(/[\u2068\u2069]/g, "");
}

/** A number as text: digits with an optional decimal part and exponent, not part of a word or a hash. */
const NUMBER = /(?<![\w.])\d+(?:\.\d+)?(?:e[-+]?\d+)?(?![\w.]*\d)(?!\w)/g;

/** A coefficient of a formula: written against a variable or an operator (`610.5·exp`, `17.269θ`, `(237.3+θ)`). */
function isFormulaCoefficient(text: string, start: number, end: number): boolean {
  const after = text.slice(end, end + 2);
  return /^[·θ]/.test(after) || (text[start - 1] === "(" && after.startsWith("+θ"));
}

/** Numbers printed against the rule, each with its context. */
function offending(text: string): string[] {
  const found: string[] = [];
  for (const m of text.matchAll(NUMBER)) {
    const token = m[0];
    const start = m.index;
    const end = start + token.length;
    if (isFormulaCoefficient(text, start, end)) continue;
    const context = () =>
      `"${token}" in …${text.slice(Math.max(0, start - 60), end + 30).replace(/\s+/g, " ")}…`;
    if (/e/.test(token)) {
      found.push(`exponent notation: ${context()}`);
      continue;
    }
    const [whole = "", decimals = ""] = token.split(".");
    if (decimals === "") continue; // integers: counts, years, whole watts
    const significant = (whole + decimals).replace(/^0+/, "").length;
    // Temperatures and thicknesses print to 0.1 (one decimal), which the tables state in their units: 106.4 °F.
    if (significant > 3 && decimals.length > 1) {
      found.push(`${significant} significant figures: ${context()}`);
    }
  }
  return found;
}

for (const units of ["SI", "IP"] as const) {
  Deno.test(`${units} demo package: no exponent notation and no number beyond three significant figures`, async () => {
    const text = shownText(await demo(units));
    assert.ok(text.length > 50_000, `the scan sees the package (${text.length} characters)`);
    const found = offending(text);
    assert.deepEqual(found.slice(0, 12), [], `${found.length} numbers against the format`);
  });
}

Deno.test("the scan flags exponent notation and long decimals (it can fail)", () => {
  assert.equal(
    offending("change 3.73e-5, value 0.20889695019725435, 24.880000000000003 and 7.0866 in").length,
    4,
  );
  assert.deepEqual(
    offending("0.209 W/(m²·K), 3.73 × 10⁻⁵, 102.5 mm, 2026-11-20, EW-1, 610.5·exp(17.269θ/(237.3+θ))"),
    [],
  );
});

Deno.test("text quoted from results prints three significant figures with × 10ⁿ, formulas as written", () => {
  assert.equal(
    quotedNumbers("Limit max-u not met by EW-1: 0.20889695019725435 against 0.18", SI_DISPLAY),
    "Limit max-u not met by EW-1: 0.209 against 0.18",
  );
  assert.equal(
    quotedNumbers("last day-to-day change 3.73e-5, bound 9.89e-6", SI_DISPLAY),
    "last day-to-day change 3.73\u2009×\u200910⁻⁵, bound 9.89\u2009×\u200910⁻⁶",
  );
  const formula = "p_sat = 610.5·exp(17.269θ/(237.3+θ)) for θ ≥ 0 °C";
  assert.equal(quotedNumbers(formula, SI_DISPLAY), formula);
  assert.equal(quotedNumbers(formula, IP_DISPLAY), formula, "a formula keeps its SI bounds in IP");
});

Deno.test("IP: numbers with an SI unit in quoted text are converted (°C, K, W/(m²·K), m²·K/W, Pa)", () => {
  // 1 W/(m²·K) = 0.176110 Btu/(h·ft²·°F) and 1 m²·K/W = 5.67826 h·ft²·°F/Btu (NIST SP 811, Appendix B, exact
  // definitions of the Btu_IT, foot and °F); 1 in. Hg (conventional) = 3386.389 Pa (NIST SP 811, Appendix B).
  assert.equal(
    quotedNumbers("h_o = 17 W/(m²·K); R_si = 0.25 m²·K/W; correction 3.51 K; −4.5 °C; 1000 Pa", IP_DISPLAY),
    "h_o = 2.99 Btu/(h·ft²·°F); R_si = 1.42 h·ft²·°F/Btu; correction 6.32 Δ°F; 23.9 °F; 0.295 in. Hg",
  );
  assert.equal(PA_PER_IN_HG, 3386.389);
});
