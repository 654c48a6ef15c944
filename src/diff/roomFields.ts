/** The comparable keys of a `room` block and of its surfaces, windows, gains and thermal bridges (README "Rooms"). */
import type {
  PointBridge,
  Room,
  RoomBoundary,
  RoomGain,
  RoomSurface,
  RoomWindow,
  ThermalBridge,
} from "../project/roomModel.ts";
import { type Field, field, profileFields, UNIT } from "./fields.ts";

/** The room's own keys (its lists are compared item by item). */
export function roomFields(r: Room): Field[] {
  const v = r.ventilation;
  const g = r.ground;
  return [
    ...field("name", r.name),
    ...field("design-day", r.designDay),
    ...field("heating", r.heating),
    ...profileFields("air-temperature", r.airTemperature),
    ...field("volume", r.volumeM3, "m³"),
    ...field("ventilation.outdoor-air", v?.kind === "outdoor-air" ? v.flowM3PerS : undefined, "m³/s"),
    ...field("ventilation.air-changes", v?.kind === "air-changes" ? v.perHour : undefined, "1/h"),
    ...field("ground.soil-conductivity", g?.soilConductivity, UNIT.conductivity),
    ...field("ground.temperature", g?.temperatureC, UNIT.celsius),
    ...field("ground.annual-mean-outdoor", g?.annualMeanOutdoorC, UNIT.celsius),
    ...field("ground.wall-thickness", g?.wallThicknessM, UNIT.length),
  ];
}

function boundaryFields(b: RoomBoundary): Field[] {
  if (b.kind !== "adjacent") return field("boundary", b.kind);
  return [
    ...field("boundary", b.kind),
    ...profileFields("adjacent", b.temperature),
    ...field("heating-temperature", b.heatingC, UNIT.celsius),
  ];
}

/** The keys of one room surface. */
export function roomSurfaceFields(s: RoomSurface): Field[] {
  return [
    ...field("construction", s.construction),
    ...field("area", s.areaM2, UNIT.area),
    ...field("azimuth", s.azimuthDeg, UNIT.angle),
    ...field("tilt", s.tiltDeg, UNIT.angle),
    ...boundaryFields(s.boundary),
    ...field("absorptance", s.absorptance),
    ...field("exposed-perimeter", s.exposedPerimeterM, UNIT.length),
  ];
}

/** The keys of one window; its angle dependence as text, `angle°: ratio` pairs. */
export function roomWindowFields(w: RoomWindow): Field[] {
  const angles = w.angleDependence?.map((p) => `${p.incidenceDeg}°: ${p.ratio}`).join(", ");
  return [
    ...field("in", w.in),
    ...field("area", w.areaM2, UNIT.area),
    ...field("u-value", w.uValue, UNIT.coefficient),
    ...field("solar-factor", w.solarFactor),
    ...field("frame-fraction", w.frameFraction),
    ...field("solar-factor-by-angle", angles),
  ];
}

/** The keys of one internal gain (its name is its identity). */
export function roomGainFields(g: RoomGain): Field[] {
  return [
    ...field("sensible", g.sensibleW, "W"),
    ...field("radiant-fraction", g.radiantFraction),
    ...field("latent", g.latentW, "W"),
    ...field("schedule", g.schedule),
  ];
}

/** The keys of a linear thermal bridge (its name is its identity). */
export function thermalBridgeFields(b: ThermalBridge): Field[] {
  return [
    ...field("psi", b.psi, "W/(m·K)"),
    ...field("length", b.lengthM, UNIT.length),
    ...field("source", b.source),
  ];
}

/** The keys of a point thermal bridge (its name is its identity). */
export function pointBridgeFields(b: PointBridge): Field[] {
  return [...field("chi", b.chi, "W/K"), ...field("count", b.count), ...field("source", b.source)];
}
