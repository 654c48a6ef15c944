import assert from "node:assert/strict";
import { parseWeatherCsv, type WeatherParseResult } from "../../src/climate/weatherCsv.ts";
import type { Diagnostic } from "../../src/project/diagnostic.ts";

const HEADER = "time,dry-bulb,global-horizontal,diffuse-horizontal";

/** Hourly rows from 2031-01-01T01:00 with the given dry bulb, global and diffuse values. */
function rows(count: number, start = 1): string[] {
  return Array.from({ length: count }, (_, k) => {
    const h = start + k;
    const day = 1 + Math.floor(h / 24);
    return `2031-01-${String(day).padStart(2, "0")}T${String(h % 24).padStart(2, "0")}:00,${5 + k % 3},${
      10 * k
    },${5 * k}`;
  });
}

function parse(lines: readonly string[], timestepS = 3600, firstLine = 1): WeatherParseResult {
  return parseWeatherCsv(lines.join("\n"), "weather/test.csv", firstLine, timestepS);
}

function errors(result: WeatherParseResult): Diagnostic[] {
  assert.equal(result.ok, false, "expected errors");
  return result.diagnostics;
}

/** The one diagnostic of a failed parse: message and 1-based line (and column). */
function only(result: WeatherParseResult): { message: string; line: number; col: number; hint?: string } {
  const list = errors(result);
  assert.equal(list.length, 1, `expected one diagnostic, got ${list.map((d) => d.message).join(" | ")}`);
  const d = list[0]!;
  return d.hint === undefined
    ? { message: d.message, line: d.at.line, col: d.at.col }
    : { message: d.message, line: d.at.line, col: d.at.col, hint: d.hint };
}

Deno.test("parseWeatherCsv reads a well-formed file; LF, CRLF and a BOM give the same series", () => {
  const lines = [HEADER, ...rows(4)];
  const lf = parse(lines);
  const crlf = parseWeatherCsv(`\uFEFF${lines.join("\r\n")}\r\n`, "weather/test.csv", 1, 3600);
  assert.ok(lf.ok && crlf.ok);
  assert.deepEqual(crlf.weather, lf.weather);
  assert.deepEqual(lf.weather.startTime, { year: 2031, month: 1, day: 1, hour: 1, minute: 0 });
  assert.equal(lf.weather.count, 4);
  assert.deepEqual([...lf.weather.dryBulbC], [5, 6, 7, 5]);
  assert.deepEqual([...lf.weather.globalHorizontalWPerM2], [0, 10, 20, 30]);
  assert.deepEqual([...lf.weather.diffuseHorizontalWPerM2], [0, 5, 10, 15]);
  assert.equal(lf.weather.directNormalWPerM2, undefined);
  assert.deepEqual(lf.diagnostics, []);
});

Deno.test("parseWeatherCsv accepts columns in any order and the optional direct-normal column", () => {
  const result = parse([
    "diffuse-horizontal, time ,direct-normal,dry-bulb,global-horizontal",
    "50,2031-06-01T12:00,700,21.5,600",
    "40,2031-06-01T13:00,650,-3.25e1,550",
  ]);
  assert.ok(result.ok);
  assert.deepEqual([...result.weather.dryBulbC], [21.5, -32.5]);
  assert.deepEqual([...(result.weather.directNormalWPerM2 ?? [])], [700, 650]);
  assert.deepEqual([...result.weather.diffuseHorizontalWPerM2], [50, 40]);
});

Deno.test("monthOfStep is the month of the interval ending at each row (hour-ending data)", () => {
  // 2031-02-01T00:00 ends the interval 31 January 23:00–24:00, so it counts for January; 01:00 for February.
  const result = parse([
    HEADER,
    "2031-01-31T23:00,1,0,0",
    "2031-02-01T00:00,1,0,0",
    "2031-02-01T01:00,1,0,0",
  ]);
  assert.ok(result.ok);
  assert.deepEqual([...result.weather.monthOfStep], [1, 1, 2]);
  const yearEnd = parse([HEADER, "2031-12-31T23:00,1,0,0", "2032-01-01T00:00,1,0,0"]);
  assert.ok(yearEnd.ok);
  assert.deepEqual([...yearEnd.weather.monthOfStep], [12, 12]);
});

Deno.test("a missing required column is an error naming it", () => {
  assert.deepEqual(only(parse(["time,dry-bulb,global-horizontal", "2031-01-01T01:00,5,0"])), {
    message: 'Missing column "diffuse-horizontal" in the weather file header',
    line: 1,
    col: 1,
    hint:
      "the header needs time, dry-bulb, global-horizontal, diffuse-horizontal (direct-normal is optional), in any order",
  });
});

Deno.test("an unknown column is an error listing the allowed columns, at its column", () => {
  const d = only(parse([`${HEADER},wind-speed`, "2031-01-01T01:00,5,0,0,3"]));
  assert.equal(
    d.message,
    'Unknown column "wind-speed" in the weather file; allowed columns: time, dry-bulb, global-horizontal, ' +
      "diffuse-horizontal, direct-normal",
  );
  assert.equal(d.line, 1);
  assert.equal(d.col, HEADER.length + 2);
});

Deno.test("a duplicate column and a semicolon-separated header are errors", () => {
  assert.equal(only(parse([`${HEADER},dry-bulb`])).message, 'Column "dry-bulb" appears twice');
  assert.equal(
    only(parse(["time;dry-bulb;global-horizontal;diffuse-horizontal", "2031-01-01T01:00;5;0;0"])).message,
    'The header "time;dry-bulb;global-horizontal;diffuse-horizontal" has one column: columns are separated by commas',
  );
});

Deno.test("a step different from the scenario time step is an error naming the line and the expected time", () => {
  const d = only(parse([HEADER, "2031-01-01T01:00,5,0,0", "2031-01-01T01:30,5,0,0"]));
  assert.deepEqual([d.line, d.col], [3, 1]);
  assert.equal(
    d.message,
    "Time 2031-01-01T01:30 is 30 min after the previous row; expected 2031-01-01T02:00 (the scenario's time step is 1 h)",
  );
  // The same rows are right for a 30 min scenario.
  assert.ok(parse([HEADER, "2031-01-01T01:00,5,0,0", "2031-01-01T01:30,5,0,0"], 1800).ok);
});

Deno.test("a gap, a duplicate and a backwards step are errors naming the line and the expected time", () => {
  const lines = [HEADER, ...rows(6)];
  const gap = [...lines.slice(0, 3), ...lines.slice(5)]; // rows at 03:00 and 04:00 removed
  assert.deepEqual(only(parse(gap)), {
    message: "Time 2031-01-01T05:00 leaves a gap of 2 rows; expected 2031-01-01T03:00 (step 1 h)",
    line: 4,
    col: 1,
  });
  const duplicate = [...lines.slice(0, 3), lines[2]!, ...lines.slice(3)];
  assert.deepEqual(only(parse(duplicate)), {
    message: "Time 2031-01-01T02:00 repeats the previous row; expected 2031-01-01T03:00 (step 1 h)",
    line: 4,
    col: 1,
  });
  const backwards = [HEADER, "2031-01-01T05:00,5,0,0", "2031-01-01T04:00,5,0,0", "2031-01-01T05:00,5,0,0"];
  const list = errors(parse(backwards));
  assert.equal(
    list[0]!.message,
    "Time 2031-01-01T04:00 goes back from the previous row 2031-01-01T05:00; expected 2031-01-01T06:00 (step 1 h)",
  );
  assert.equal(list[0]!.at.line, 3);
});

Deno.test("line numbers count from firstLine and include blank lines", () => {
  const d = only(parse([HEADER, "2031-01-01T01:00,5,0,0", "", "2031-01-01T03:00,5,0,0"], 3600, 10));
  assert.equal(d.line, 13);
  assert.equal(
    d.message,
    "Time 2031-01-01T03:00 leaves a gap of 1 row; expected 2031-01-01T02:00 (step 1 h)",
  );
});

Deno.test("a decimal comma splits a value: the row has too many values, with a hint", () => {
  assert.deepEqual(only(parse([HEADER, "2031-01-01T01:00,21,5,0,0", "2031-01-01T02:00,21.5,0,0"])), {
    message: "Expected 4 values (time, dry-bulb, global-horizontal, diffuse-horizontal), found 5",
    line: 2,
    col: 1,
    hint:
      "a decimal comma (21,5) or a thousands separator (1,020) splits a number in two: write 21.5 or 1020",
  });
  assert.equal(
    only(parse([HEADER, "2031-01-01T01:00,21,0"])).message,
    "Expected 4 values (time, dry-bulb, global-horizontal, diffuse-horizontal), found 3",
  );
});

Deno.test("malformed numbers are errors with line, column name and value", () => {
  const cases: [string, string, number][] = [
    ["2031-01-01T01:00,abc,0,0", 'Cannot read "abc" in column dry-bulb as a number', 18],
    ["2031-01-01T01:00,NaN,0,0", 'Cannot read "NaN" in column dry-bulb as a number', 18],
    ["2031-01-01T01:00,5,1 020,0", 'Cannot read "1 020" in column global-horizontal as a number', 20],
    ["2031-01-01T01:00,5,0,", "Missing value in column diffuse-horizontal", 22],
    ["2031-01-01T01:00,5 °C,0,0", 'Cannot read "5 °C" in column dry-bulb as a number', 18],
  ];
  for (const [row, message, col] of cases) {
    const d = only(parse([HEADER, row]));
    assert.deepEqual([d.message, d.line, d.col], [message, 2, col], row);
  }
});

Deno.test("malformed times are errors saying what is expected", () => {
  const cases: [string, string][] = [
    ["2031-1-1 01:00", 'Cannot read time "2031-1-1 01:00": expected YYYY-MM-DDTHH:MM, e.g. 2031-07-21T14:00'],
    [
      "2031-01-01T01:00Z",
      'Cannot read time "2031-01-01T01:00Z": times are local standard time and carry no UTC offset or Z',
    ],
    ["2031-02-29T01:00", 'Cannot read time "2031-02-29T01:00": day 29 is not in 1…28 for 2031-02'],
    [
      "2031-01-01T24:00",
      'Cannot read time "2031-01-01T24:00": hour 24 is not accepted: write 00:00 of the next day',
    ],
  ];
  for (const [time, message] of cases) {
    const d = only(parse([HEADER, `${time},5,0,0`]));
    assert.deepEqual([d.message, d.line], [message, 2], time);
  }
  // 2032 is a leap year (Gregorian rule), so 29 February exists.
  assert.ok(parse([HEADER, "2032-02-29T01:00,5,0,0"]).ok);
});

Deno.test("a bad time does not make the next row look like a gap", () => {
  const list = errors(
    parse([HEADER, "2031-01-01T01:00,5,0,0", "2031-01-01 02:00,5,0,0", "2031-01-01T03:00,5,0,0"]),
  );
  assert.deepEqual(list.map((d) => d.at.line), [3]);
});

Deno.test("irradiance above 1400 W/m² is an error; a small negative value is set to 0 with one warning", () => {
  assert.deepEqual(only(parse([HEADER, "2031-06-01T13:00,25,1520,100"])), {
    message: "global-horizontal 1520 W/m² is above the plausible limit of 1400 W/m²",
    line: 2,
    col: 21,
    hint: "irradiance is in W/m², the mean over the step (not Wh/m² or kJ/m² totals)",
  });
  const result = parse([HEADER, "2031-01-01T01:00,5,-2,-1.5", "2031-01-01T02:00,5,-0.5,0"]);
  assert.ok(result.ok);
  assert.deepEqual([...result.weather.globalHorizontalWPerM2], [0, 0]);
  assert.deepEqual([...result.weather.diffuseHorizontalWPerM2], [0, 0]);
  assert.equal(result.diagnostics.length, 1);
  assert.equal(result.diagnostics[0]!.severity, "warning");
  assert.equal(
    result.diagnostics[0]!.message,
    "3 small negative irradiance values (down to −10 W/m²) set to 0; the first at line 2, global-horizontal -2",
  );
  assert.equal(
    only(parse([HEADER, "2031-01-01T01:00,5,-25,0"])).message,
    "global-horizontal -25 W/m² is negative",
  );
});

Deno.test("dry bulb outside −90…60 °C and diffuse above global are errors", () => {
  assert.equal(
    only(parse([HEADER, "2031-07-01T15:00,95,800,100"])).message,
    "dry-bulb 95 °C is outside the plausible range -90…60 °C",
  );
  assert.ok(parse([HEADER, "2031-07-01T15:00,-89.5,0,0"]).ok);
  assert.deepEqual(only(parse([HEADER, "2031-07-01T15:00,25,250,320"])), {
    message: "diffuse-horizontal 320 W/m² exceeds global-horizontal 250 W/m² by more than 5 W/m²",
    line: 2,
    col: 25,
    hint: "diffuse is part of global: check that the two columns are not swapped",
  });
  assert.ok(parse([HEADER, "2031-07-01T15:00,25,250,254"]).ok, "within the 5 W/m² tolerance");
});

Deno.test("reading stops after 20 errors with a note", () => {
  const bad = Array.from({ length: 30 }, (_, k) => `2031-01-01T${String(k % 24).padStart(2, "0")}:00,x,0,0`);
  const list = errors(parse([HEADER, ...bad]));
  assert.equal(list.filter((d) => d.severity === "error").length, 20);
  assert.equal(list.length, 21);
  assert.equal(list[20]!.severity, "note");
  assert.equal(list[20]!.message, "Stopped reading the weather file after 20 errors");
});

Deno.test("an empty file and a header without rows are errors", () => {
  assert.equal(
    only(parseWeatherCsv("\uFEFF\r\n", "w.csv", 1, 3600)).message,
    "The weather file is empty: expected a header line such as time,dry-bulb,global-horizontal,diffuse-horizontal",
  );
  assert.equal(only(parse([HEADER, ""])).message, "The weather file has a header but no data rows");
});

Deno.test("comment lines before the header are read; '# synthetic: <note>' marks the file synthetic", () => {
  const plain = parse([HEADER, ...rows(3)]);
  const marked = parse(["# made for the test", "# synthetic: sine swing, invented", HEADER, ...rows(3)]);
  assert.ok(plain.ok && marked.ok);
  assert.equal(plain.synthetic, undefined);
  assert.deepEqual(marked.synthetic, { note: "sine swing, invented", line: 2 });
  // The comments do not change the series.
  assert.deepEqual(marked.weather, plain.weather);
  const bare = parse(["# synthetic: true", HEADER, ...rows(3)]);
  assert.ok(bare.ok);
  assert.deepEqual(bare.synthetic, { note: "", line: 1 });
  const no = parse(["# synthetic: false", "# measured at the test site", HEADER, ...rows(3)]);
  assert.ok(no.ok);
  assert.equal(no.synthetic, undefined);
});

Deno.test("a synthetic marker without its colon or in capitals is an error at its line, not a silent comment", () => {
  for (const comment of ["# synthetic invented", "  # Synthetic: invented", "#SYNTHETIC"]) {
    const d = only(parse([comment, HEADER, ...rows(3)]));
    assert.equal(d.line, 1);
    assert.equal(d.col, comment.indexOf("#") + 1);
    assert.equal(d.message, `Cannot read the comment "${comment.trim()}" as a synthetic-data marker`);
    assert.match(d.hint ?? "", /# synthetic: <how the data were made>/);
  }
});
