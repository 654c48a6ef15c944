import type { Position } from "./position.ts";
import type { TemperatureProfile } from "./temperatureProfile.ts";

/**
 * A `room` block, validated and in SI (README, "Rooms"). Optional keys stay absent here; defaults are filled and
 * logged when computing. Every list keeps the order of the block.
 */
export interface Room {
  readonly id: string;
  readonly name: string;
  /** Id of the design-day scenario whose weather, sun and time step drive the room. */
  readonly designDay: string;
  readonly designDayAt: Position;
  /** Id of a `kind: heating` scenario for the design heat loss, when given. */
  readonly heating?: string;
  readonly heatingAt?: Position;
  /** Cooling set point of the room air (constant or 24 hourly values), °C. */
  readonly airTemperature: TemperatureProfile;
  /** m³ */
  readonly volumeM3: number;
  readonly surfaces: readonly RoomSurface[];
  readonly windows: readonly RoomWindow[];
  readonly gains: readonly RoomGain[];
  readonly ventilation?: RoomVentilation;
  readonly thermalBridges: readonly ThermalBridge[];
  readonly pointBridges: readonly PointBridge[];
  /** Ground parameters as written; absent keys take the logged defaults. */
  readonly ground?: RoomGround;
  readonly at: Position;
}

/** What lies on the far side of a room surface. */
export type RoomBoundary =
  /** Outdoor air and sun: driven by the design day's sol-air temperature. */
  | { readonly kind: "outdoor" }
  /** The ground: the floor's U by ISO 13370; the design day holds its far side at the ground temperature. */
  | { readonly kind: "ground" }
  /**
   * A space held at a given temperature (constant or hourly), °C, on the design day; `heatingC` is its temperature
   * in the heating case (extension key `heating-temperature`; absent = the room's own heating set point, b = 0, logged).
   */
  | {
    readonly kind: "adjacent";
    readonly temperature: TemperatureProfile;
    readonly heatingC?: number;
  }
  /** A space like this one: the surface stores and releases heat but passes none across. */
  | { readonly kind: "same-as-room" };

export interface RoomSurface {
  readonly id: string;
  readonly construction: string;
  /** Gross area, m², windows in it included (they are taken out when computing). */
  readonly areaM2: number;
  /** degrees clockwise from north */
  readonly azimuthDeg?: number;
  /** degrees from horizontal: 0 = a roof or ceiling facing up outside, 90 = a wall, 180 = a floor */
  readonly tiltDeg: number;
  readonly boundary: RoomBoundary;
  /** Solar absorptance of the outside face (outdoor surfaces). */
  readonly absorptance?: number;
  /** Exposed perimeter P of a ground floor, m (ISO 13370). */
  readonly exposedPerimeterM?: number;
  readonly at: Position;
}

export interface RoomWindow {
  readonly id: string;
  /** Id of the room surface the window sits in; its area is taken out of that surface. */
  readonly in: string;
  /** m² (whole window, frame included) */
  readonly areaM2: number;
  /** U_w, W/(m² K) */
  readonly uValue: number;
  /** g, total solar energy transmittance of the glazing at normal incidence (0…1). */
  readonly solarFactor: number;
  /** Frame fraction of the window area (0…1); the glazed fraction is 1 − this. */
  readonly frameFraction: number;
  /** Optional angle dependence: g(θ)/g(0) at incidence angles in degrees; absent = constant (logged). */
  readonly angleDependence?: readonly { readonly incidenceDeg: number; readonly ratio: number }[];
  readonly at: Position;
}

export interface RoomGain {
  readonly name: string;
  /** Peak sensible gain, W. */
  readonly sensibleW: number;
  /** Radiant fraction of the sensible gain (0…1). */
  readonly radiantFraction: number;
  /** Latent gain, W, reported apart from the sensible load. */
  readonly latentW?: number;
  /** 24 hourly fractions of the peak (k = k:00 … k+1:00); absent = always on (1). */
  readonly schedule?: readonly number[];
  readonly at: Position;
}

export type RoomVentilation =
  | { readonly kind: "outdoor-air"; /** m³/s */ readonly flowM3PerS: number; readonly at: Position }
  | { readonly kind: "air-changes"; /** 1/h */ readonly perHour: number; readonly at: Position };

/** A linear thermal bridge: ψ, W/(m K), over a length, m. */
export interface ThermalBridge {
  readonly name: string;
  readonly psi: number;
  readonly lengthM: number;
  readonly source?: string;
  readonly at: Position;
}

/** A point thermal bridge: χ, W/K, counted `count` times. */
export interface PointBridge {
  readonly name: string;
  readonly chi: number;
  readonly count: number;
  readonly source?: string;
  readonly at: Position;
}

/** Ground parameters for ISO 13370 and the design day (absent = default, logged). */
export interface RoomGround {
  /** λ_g, W/(m K) */
  readonly soilConductivity?: number;
  /** Ground temperature under the floor on the design day, °C. */
  readonly temperatureC?: number;
  /** Annual mean outdoor temperature, °C (ISO 13370 heating loss). */
  readonly annualMeanOutdoorC?: number;
  /** Thickness of the wall at ground level w, m (ISO 13370 d_t). */
  readonly wallThicknessM?: number;
  readonly at: Position;
}
