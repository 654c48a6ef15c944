import assert from "node:assert/strict";
import { steadyPeriodicFlux } from "../../src/engine/surfaceFlux.ts";
import { computeWeatherYear } from "../../src/scenarios/weatherYear.ts";
import { csvText } from "../../src/tables/csvTable.ts";
import { HEAVY_WALL, LIGHT_WALL, massive, resistive } from "../engine/walls.ts";
import {
  construction,
  context,
  csvColumn,
  HOURS_IN_MONTH_2031,
  surface,
  weather,
  weatherScenario,
  yearCsv,
} from "./_weatherFixture.ts";

/** R of HEAVY_WALL written out layer by layer (R_se + Σ L/λ + R_cavity + R_si), m²K/W. */
const HEAVY_R = 0.04 + 0.015 / 1.0 + 0.105 / 0.77 + 0.18 + 0.08 / 0.035 + 0.15 / 1.65 + 0.013 / 0.57 + 0.13;
/** An invented roof: 20 mm screed, 150 mm insulation, 200 mm concrete slab, films 0.04 / 0.10. */
const ROOF = {
  layers: [massive(0.02, 1.15, 2000, 1000), massive(0.15, 0.035, 30, 1400), massive(0.2, 1.65, 2300, 1000)],
  outsideResistance: 0.04,
  insideResistance: 0.10,
};
const ROOF_R = 0.04 + 0.02 / 1.15 + 0.15 / 0.035 + 0.2 / 1.65 + 0.10;

const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

Deno.test("a constant-weather year gives the steady flux U·(T_sa − T_i) every hour and exact monthly totals", () => {
  // Isotropic sky (Liu & Jordan 1963): E = D (1 + cos Σ)/2 + G ρg (1 − cos Σ)/2 with beam G − D = 0.
  // Vertical: 300·0.5 + 300·0.2·0.5 = 180 W/m²; horizontal: 300 W/m².
  // Sol-air (ASHRAE Fundamentals Ch. 18, from memory): T_sa = T_o + α E / h_o − ε ΔR cos Σ / h_o, h_o = 1/R_se = 25;
  // ΔR = 3.9 K × 17 W/(m²K) for a horizontal surface (fluxnote's stated default), 0 for vertical.
  const ctx = context([construction("EW", HEAVY_WALL), construction("RF", ROOF)]);
  const scenario = weatherScenario([
    surface({ id: "wall", construction: "EW", azimuthDeg: 180, tiltDeg: 90, areaM2: 10, absorptance: 0.6 }),
    surface({ id: "roof", construction: "RF", tiltDeg: 0, areaM2: 50, absorptance: 0.9, emittance: 0.9 }),
  ]);
  const outcome = computeWeatherYear(scenario, weather(yearCsv(() => [5, 300, 300])), ctx);
  const solAirWall = 5 + (0.6 * 180) / 25;
  const solAirRoof = 5 + (0.9 * 300) / 25 - (0.9 * 3.9 * 17) / 25;
  const csv = csvText(outcome.csv[0]!);
  for (
    const [id, r, solAir, area] of [["wall", HEAVY_R, solAirWall, 10], [
      "roof",
      ROOF_R,
      solAirRoof,
      50,
    ]] as const
  ) {
    const q = (solAir - 20) / r;
    const flux = csvColumn(csv, `${id}:inside_flux_W_m2`);
    assert.equal(flux.length, 8760);
    assert.ok(
      flux.every((f) => Math.abs(f - q) <= 5e-5 + 1e-9 * Math.abs(q)),
      `${id}: flux ${flux[0]} vs ${q}`,
    );
    for (const t of csvColumn(csv, `${id}:sol_air_degC`)) assert.ok(Math.abs(t - solAir) <= 5e-4);
    const s = outcome.results.surfaces[id]!;
    assert.ok(relative(s.totals.loss_J, -q * area * 8760 * 3600) < 1e-9, `${id} annual loss`);
    assert.equal(s.totals.gain_J, 0);
    s.totals.monthly.forEach((m, i) => {
      assert.ok(
        relative(m.loss_J, -q * area * HOURS_IN_MONTH_2031[i]! * 3600) < 1e-9,
        `${id} month ${i + 1}`,
      );
    });
    const dailyCsv = csvText(outcome.csv.find((f) => f.path.endsWith("-daily.csv"))!);
    const dailyMax = csvColumn(dailyCsv, `${id}:max_heat_gain_W`);
    assert.equal(dailyMax.length, 365);
    assert.ok(dailyMax.every((v) => Math.abs(v - q * area) <= 0.006), `${id} daily max`);
  }
  assert.equal(outcome.results.daily.firstDate, "2031-01-01");
  for (const c of outcome.checks) assert.ok(c.pass, `${c.id} ${c.subject}: ${c.value}`);
});

Deno.test("a sinusoidal outdoor year without sun agrees with the steady-periodic solution after the warm-up", () => {
  const ctx = context([construction("EW", HEAVY_WALL)]);
  const scenario = weatherScenario([
    surface({ id: "wall", construction: "EW", azimuthDeg: 180, tiltDeg: 90, areaM2: 1, absorptance: 0.6 }),
  ]);
  const outdoorAt = (h: number) => 10 + 8 * Math.cos((2 * Math.PI * (h - 15)) / 24);
  const outcome = computeWeatherYear(scenario, weather(yearCsv((h) => [outdoorAt(h % 24), 0, 0])), ctx);
  const day = Array.from({ length: 24 }, (_, h) => outdoorAt(h));
  const periodic = steadyPeriodicFlux(ctx.analysis("EW").airToAir.modes, day, new Array<number>(24).fill(20));
  const flux = csvColumn(csvText(outcome.csv[0]!), "wall:inside_flux_W_m2");
  const amplitude = Math.max(...periodic.insideWPerM2) - Math.min(...periodic.insideWPerM2);
  assert.ok(amplitude > 0.05, "the test needs a visible daily swing");
  // Row k is at hour (k + 1) of the year; compare the first day (right after the warm-up), a middle and the last day.
  for (const k of [...Array(24).keys(), ...Array.from({ length: 24 }, (_, j) => 4000 + j), 8759]) {
    const expected = periodic.insideWPerM2[(k + 1) % 24]!;
    assert.ok(
      Math.abs(flux[k]! - expected) <= 1e-3 * amplitude + 5e-5,
      `row ${k}: ${flux[k]} vs ${expected}`,
    );
  }
  const warmUp = outcome.checks.find((c) => c.id === "warm-up")!;
  assert.ok(warmUp.pass && warmUp.value < 1e-3);
});

Deno.test("annual energy balance: Σ q Δ = U Σ (T_sa − T_i) Δ over a periodic year with sun", () => {
  // Identity: Σ_j Y_j = Σ_j Z_j = U (sum rule of response factors), so over a series whose start continues its end
  // (the periodic warm-up) the summed flux equals U times the summed temperature difference.
  const ctx = context([construction("EW", HEAVY_WALL), construction("LW", LIGHT_WALL)]);
  const scenario = weatherScenario([
    surface({
      id: "heavy-west",
      construction: "EW",
      azimuthDeg: 270,
      tiltDeg: 90,
      areaM2: 20,
      absorptance: 0.7,
    }),
    surface({
      id: "light-south",
      construction: "LW",
      azimuthDeg: 180,
      tiltDeg: 90,
      areaM2: 12,
      absorptance: 0.5,
    }),
  ]);
  const text = yearCsv((h) => {
    const day = h / 24;
    const t = 10 - 7 * Math.cos((2 * Math.PI * (day - 15)) / 365) +
      4 * Math.cos((2 * Math.PI * (h % 24 - 15)) / 24);
    const sun = Math.max(0, Math.sin((Math.PI * ((h % 24) - 6)) / 12));
    const g = Math.round(sun * (450 + 250 * Math.sin((2 * Math.PI * day) / 3.7)));
    return [Number(t.toFixed(2)), g, Math.round(g * 0.4)];
  });
  const outcome = computeWeatherYear(scenario, weather(text), ctx);
  const csv = csvText(outcome.csv[0]!);
  const indoor = csvColumn(csv, "indoor_degC");
  for (
    const [id, r] of [["heavy-west", HEAVY_R], [
      "light-south",
      0.04 + 0.009 / 0.14 + 0.15 + 0.1 / 0.04 + 0.0125 / 0.21 + 0.13,
    ]] as const
  ) {
    const area = outcome.results.surfaces[id]!.area;
    const solAir = csvColumn(csv, `${id}:sol_air_degC`);
    const sumDifference = solAir.reduce((s, t, k) => s + t - indoor[k]!, 0);
    const sumAbs = solAir.reduce((s, t, k) => s + Math.abs(t - indoor[k]!), 0);
    const totals = outcome.results.surfaces[id]!.totals;
    const netJ = totals.gain_J - totals.loss_J;
    const expectedJ = (area / r) * sumDifference * 3600;
    // CSV sol-air is rounded to 1e-3 K: that bounds the expected value to (1/r)·A·N·5e-4 K·Δ.
    const limit = outcome.checks.find((c) =>
      c.id === "energy-balance" && c.subject.endsWith(`/${id}`)
    )!.limit;
    assert.ok(limit < 1e-4, `a year's energy-balance limit ${limit} is tight`);
    const tolerance = limit * (area / r) * sumAbs * 3600 +
      (area / r) * 8760 * 5e-4 * 3600;
    assert.ok(Math.abs(netJ - expectedJ) <= tolerance, `${id}: ${netJ} vs ${expectedJ}`);
    assert.ok(sumAbs > 8760 * 5, "a year with real temperature differences");
  }
  for (const c of outcome.checks) assert.ok(c.pass, `${c.id} ${c.subject}: ${c.value}`);
});

Deno.test("monthly totals sum to the annual totals; the total is the sum of the surfaces", () => {
  const ctx = context([construction("EW", HEAVY_WALL), construction("RF", ROOF)]);
  const scenario = weatherScenario([
    surface({ id: "wall", construction: "EW", azimuthDeg: 225, tiltDeg: 90, areaM2: 30, absorptance: 0.6 }),
    surface({ id: "roof", construction: "RF", tiltDeg: 0, areaM2: 80, absorptance: 0.9 }),
  ], { kind: "hourly", hourlyC: Array.from({ length: 24 }, (_, h) => (h >= 7 && h < 19 ? 22 : 16)) });
  const text = yearCsv((h) => {
    const t = 11 - 9 * Math.cos((2 * Math.PI * (h / 24 - 15)) / 365) +
      5 * Math.cos((2 * Math.PI * (h % 24 - 15)) / 24);
    const g = Math.round(Math.max(0, Math.sin((Math.PI * ((h % 24) - 5)) / 14)) * 600);
    return [Number(t.toFixed(1)), g, Math.round(g / 3)];
  });
  const r = computeWeatherYear(scenario, weather(text), ctx).results;
  for (const totals of [r.totals, r.surfaces.wall!.totals, r.surfaces.roof!.totals]) {
    assert.equal(totals.monthly.length, 12);
    const gain = totals.monthly.reduce((s, m) => s + m.gain_J, 0);
    const loss = totals.monthly.reduce((s, m) => s + m.loss_J, 0);
    assert.ok(relative(gain, totals.gain_J) < 1e-12 && relative(loss, totals.loss_J) < 1e-12);
    assert.ok(totals.gain_J > 0 && totals.loss_J > 0, "both gains and losses in this year");
  }
  // Net energy is additive over surfaces (gain − loss of a sum = Σ (gain − loss)).
  const net = (t: { gain_J: number; loss_J: number }) => t.gain_J - t.loss_J;
  assert.ok(relative(net(r.totals), net(r.surfaces.wall!.totals) + net(r.surfaces.roof!.totals)) < 1e-9);
  // Series stay out of results.json (DESIGN.md §4).
  assert.deepEqual([r.outdoor, r.indoor, r.totalHeatGain, r.surfaces.wall!.heatGain], [[], [], [], []]);
  assert.equal(r.csv, "csv/scenario-test-year.csv");
});

Deno.test("peak time: a one-hour spike through a massless wall peaks at that row, with hours since the first row", () => {
  const massless = { layers: [resistive(2.0)], outsideResistance: 0.04, insideResistance: 0.13 };
  const ctx = context([construction("M", massless)]);
  const scenario = weatherScenario([
    surface({ id: "north", construction: "M", azimuthDeg: 0, areaM2: 4, absorptance: 0 }),
  ]);
  // 2031-07-21T14:00 is 181 + 20 = 201 days and 14 h after 2031-01-01T00:00, i.e. hour 4838; first row is hour 1.
  const spikeHour = 201 * 24 + 14;
  const outcome = computeWeatherYear(
    scenario,
    weather(yearCsv((h) => [h === spikeHour ? 35 : 18, 0, 0])),
    ctx,
  );
  const s = outcome.results.surfaces.north!;
  assert.equal(s.peakTime, "2031-07-21T14:00");
  assert.equal(s.peak.time_h, spikeHour - 1);
  assert.ok(relative(s.peak.heatGain, (4 * (35 - 20)) / 2.17) < 1e-9);
  assert.equal(outcome.results.peakTime, "2031-07-21T14:00");
  assert.equal(s.peakLoss.heatGain.toFixed(6), ((4 * (18 - 20)) / 2.17).toFixed(6));
});

Deno.test("the CSV has one row per step, documented columns and plain numbers", () => {
  const ctx = context([construction("EW", LIGHT_WALL)]);
  const scenario = weatherScenario([
    surface({ id: "e", construction: "EW", azimuthDeg: 90, areaM2: 3, absorptance: 0.5 }),
    surface({
      id: "given",
      construction: "EW",
      areaM2: 2,
      solAirC: Array.from({ length: 24 }, (_, h) => 10 + h),
    }),
  ]);
  const outcome = computeWeatherYear(
    scenario,
    weather(yearCsv((h) => [(h % 48) / 4 - 3, h % 24 === 12 ? 500 : 0, h % 24 === 12 ? 500 : 0])),
    ctx,
  );
  const lines = csvText(outcome.csv[0]!).trimEnd().split("\n");
  assert.equal(outcome.csv[0]!.path, "csv/scenario-test-year.csv");
  assert.equal(lines.length, 8761);
  assert.equal(
    lines[0],
    "time,outdoor_degC,indoor_degC,e:incident_W_m2,e:sol_air_degC,e:inside_flux_W_m2,e:heat_gain_W," +
      "given:incident_W_m2,given:sol_air_degC,given:inside_flux_W_m2,given:heat_gain_W,total_heat_gain_W",
  );
  assert.ok(lines[1]!.startsWith("2031-01-01T01:00,-2.75,20,"));
  assert.ok(lines[8760]!.startsWith("2032-01-01T00:00,"));
  assert.ok(
    lines.slice(1).every((l: string) => !/e[+-]?\d|NaN|Infinity|(^|,)-0(\.0+)?(,|$)/.test(l.slice(17))),
  );
  // A surface with given sol-air values: hour k value at k:00 (01:00 → 11 °C), no incident irradiance.
  assert.equal(lines[1]!.split(",")[7], "");
  assert.equal(lines[1]!.split(",")[8], "11");
  // Irradiance at a row time = mean of the intervals ending and starting there (fluxnote's stated rule): all-diffuse
  // 500 W/m² in the interval 11:00–12:00 only gives 500·(1 + cos 90°)/2 + 500·0.2·(1 − cos 90°)/2 = 300 W/m² on the
  // wall for that interval (isotropic sky), hence 150 W/m² at 11:00 and at 12:00, 0 at 10:00 and 13:00.
  assert.deepEqual([10, 11, 12, 13].map((k) => lines[k]!.split(",")[3]), [
    "0",
    "150",
    "150",
    "0",
  ]);
});
