/**
 * The thresholds of the room plausibility rules, each with its unit and where it comes from (the convention of
 * limits.ts: a document and table, "from memory", "computed" for a closed form, or "common practice, no source").
 */

import type { Limit } from "./limits.ts";

function limit(value: number, unit: string, source: string): Limit {
  return { value, unit, source };
}

export const ROOM = {
  /** Of all boxes of volume V the cube has the least surface, 6·V^(2/3); a room below it misses surfaces. */
  minAreaFactor: limit(
    0.9 * 6,
    "V^(2/3)",
    "computed: a cube has the least surface of all boxes of volume V, 6·V^(2/3) (AM–GM inequality); 10 % margin for rooms that are not quite boxes (common practice, no source)",
  ),
  /**
   * A box whose every side is at least h has at most the area of an h × h × V/h² duct, 2h² + 4V/h; with h the lowest
   * ceiling height below, more area than that (plus margin) is a double-counted surface or a volume too small.
   */
  minSide: limit(
    2,
    "m",
    "computed: a box of volume V with every side ≥ h has an area ≤ 2h² + 4V/h (the h × h × V/h² duct); h = 2 m and a 10 % margin are common practice, no source",
  ),
  areaMargin: limit(0.1, "", "common practice, no source"),
  minCeilingHeight: limit(
    2.2,
    "m",
    "common practice, no source: occupied rooms are rarely lower than 2.2–2.4 m (minimum room heights in building regulations, from memory)",
  ),
  maxCeilingHeight: limit(
    6,
    "m",
    "common practice, no source: above 6 m a room is a hall or an atrium, where a single well-mixed air node is questionable",
  ),
  /** A surface (tilt from horizontal, 180 = a floor) at or beyond this faces down and counts as floor. */
  floorTilt: limit(150, "°", "common practice, no source: within 30° of facing straight down"),
  maxWindowShare: limit(
    0.9,
    "",
    "common practice, no source: even a fully glazed façade keeps some opaque edge; above 90 % the surface's area was often written net of the window, which is then taken out twice",
  ),
  maxGainDensity: limit(
    100,
    "W/m²",
    "from memory: CIBSE Guide A (2015) Table 6.2 and ASHRAE Handbook—Fundamentals (2017) ch. 18 Tables 1, 2 and 8 put the sensible gains of offices, libraries and classrooms at about 20–60 W/m² all together (people about 7–20, lighting 5–20, equipment 5–25); 100 W/m² allows for dense rooms",
  ),
  minGainDensity: limit(
    0.5,
    "W/m²",
    "common practice, no source: one person's sensible gain (about 70 W, ASHRAE Handbook—Fundamentals ch. 18 Table 1, from memory) spread over 140 m²; a gain below it is usually kW written as W",
  ),
  minRadiantFraction: limit(
    0.1,
    "",
    "from memory: ASHRAE Handbook—Fundamentals (2017) ch. 18 Table 14 (radiant time series method) recommends 0.1–0.2 for fan-cooled equipment as the lowest radiant fraction of an internal gain",
  ),
  maxRadiantFraction: limit(
    0.8,
    "",
    "from memory: ASHRAE Handbook—Fundamentals (2017) ch. 18 Table 14 and Table 3 give at most about 0.7–0.8 for internal gains (people 0.6, lighting 0.5–0.7); 1.0 is for transmitted solar only",
  ),
  minAirChanges: limit(
    0.1,
    "1/h",
    "common practice, no source: the infiltration of a very airtight room is about 0.1–0.3 1/h (from memory)",
  ),
  maxAirChanges: limit(
    20,
    "1/h",
    "common practice, no source: offices and libraries have about 1–6 1/h of outdoor air; laboratories and kitchens can exceed 20 1/h; far above, m³/h may have been written as l/s",
  ),
  /** Largest aspect ratio a floor's outline is allowed before its exposed perimeter counts as too long. */
  maxFloorAspect: limit(
    10,
    "",
    "computed: a rectangle of area A and aspect ratio r has the perimeter 2·√A·(√r + 1/√r); r ≤ 10 (common practice, no source) gives P ≤ 6.96·√A",
  ),
  groundTiltTolerance: limit(
    10,
    "°",
    "ISO 13370:2017 clause 9 (slab on ground) treats a floor; walls against the ground are another clause that is not computed here (from memory); ±10° is common practice, no source",
  ),
  outdoorDownTilt: limit(
    135,
    "°",
    "common practice, no source: a surface more than 45° past vertical faces the ground and gets sun only from the ground's reflection",
  ),
} as const;
