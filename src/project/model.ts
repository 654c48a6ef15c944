import type { Layer } from "../engine/layer.ts";
import type { Position } from "./position.ts";
import type { Room } from "./roomModel.ts";
import type { TemperatureProfile } from "./temperatureProfile.ts";
import type { Acknowledgement, OpenPoint } from "./signOff.ts";

export type ProjectStatus = "draft" | "for-review" | "issued";
export type HeatFlowDirection = "horizontal" | "upward" | "downward";

export interface RevisionEntry {
  readonly revision: string;
  readonly date: string;
  readonly description: string;
}

/** The validated front matter of `project.md`. */
export interface ProjectInfo {
  readonly title: string;
  readonly reference: string;
  readonly revision: string;
  readonly status: ProjectStatus;
  readonly preparedBy: string;
  readonly checkedBy: string;
  readonly approvedBy?: string;
  /** ISO date, the only date printed in the package. */
  readonly date: string;
  readonly units: "SI" | "IP";
  readonly revisions: readonly RevisionEntry[];
  /** Optional sensitivity study: each material property varied by ± this fraction (e.g. 0.2). */
  readonly sensitivityVariation?: number;
  /** Optional project-wide code limits, applied to every construction unless it gives its own. */
  readonly limits?: readonly LimitSpec[];
  /** Extension (issue gate): the client and the project named on the cover. */
  readonly client?: string;
  readonly project?: string;
  /** ISO dates of the check and the approval, each printed beside its role once issued. */
  readonly checkedDate?: string;
  readonly approvedDate?: string;
  /** The user's own open points (front matter `open-points`). */
  readonly openPoints?: readonly OpenPoint[];
  /** Open items accepted for issue, each with a reason and a name (front matter `acknowledged`). */
  readonly acknowledged?: readonly Acknowledgement[];
  /** Paper size of package.pdf (front matter `paper`, A4 when absent). */
  readonly paper?: "A4" | "Letter";
}

/** A material as defined in a project block or taken from the built-in library. */
export interface MaterialDef {
  readonly id: string;
  readonly name: string;
  readonly origin: "project" | "library";
  /** W/(m K); absent for a massless material. */
  readonly conductivity?: number;
  /** kg/m^3 */
  readonly density?: number;
  /** J/(kg K) */
  readonly specificHeat?: number;
  /** m^2 K/W; present only for a massless material. */
  readonly resistance?: number;
  /** Where the values come from; empty when the project gave none. */
  readonly source: string;
  /** Library class (for plausibility), e.g. `dense-concrete`; absent for project materials unless given. */
  readonly materialClass?: string;
  readonly at: Position;
}

/** A resolved layer: the engine's SI layer plus what the package needs to show and trace it. */
export type ResolvedLayer = Layer & {
  readonly name: string;
  /** Material id the layer refers to, absent for an inline layer. */
  readonly materialId?: string;
  readonly source: string;
  readonly at: Position;
  /** Present on a bridged (framed) layer: the layer's own values are then the equivalent homogeneous layer. */
  readonly bridge?: LayerBridge;
  /** Optional ISO 6946 Annex F corrections the user gives for this layer. */
  readonly corrections?: LayerCorrections;
};

/** One material of a bridged layer as written, SI units. */
export interface BridgeComponent {
  readonly name: string;
  readonly materialId?: string;
  /** W/(m K) */
  readonly conductivity: number;
  /** kg/m^3 */
  readonly density: number;
  /** J/(kg K) */
  readonly specificHeat: number;
  readonly source: string;
}

/** A layer bridged by a second material (studs, joists) over an area fraction, as written by the user. */
export interface LayerBridge {
  /** The material that fills the rest of the layer (e.g. insulation between studs). */
  readonly base: BridgeComponent;
  /** The bridging material (e.g. timber studs). */
  readonly bridge: BridgeComponent;
  /** Area fraction of the bridging material, 0 < f < 1. */
  readonly fraction: number;
  readonly at: Position;
}

/** User-given ISO 6946 Annex F corrections on one layer (the tool ships no values of its own). */
export interface LayerCorrections {
  /** ΔU_f for mechanical fasteners, W/(m^2 K), as the user computed it. */
  readonly fastenersDeltaU?: number;
  /** Air gaps: the level (0, 1, 2) and its ΔU'' in W/(m^2 K); ΔU_g = ΔU''·(R_1/R_T)^2 is computed. */
  readonly airGaps?: { readonly level: 0 | 1 | 2; readonly deltaU2: number };
  readonly source: string;
  readonly at: Position;
}

/** The quantity a code limit bounds; `max-` limits pass when value ≤ limit, `min-` when value ≥ limit. */
export type LimitQuantity =
  | "max-u"
  | "max-periodic-transmittance"
  | "min-time-lag"
  | "min-temperature-factor";

/** A code limit written by the user with its clause (W/(m^2 K), h, or a pure number). */
export interface LimitSpec {
  readonly quantity: LimitQuantity;
  /** The limit in the unit results.json compares in: W/(m^2 K), h, or a pure number. */
  readonly limit: number;
  readonly clause: string;
  readonly scope: "project" | "construction";
  readonly at: Position;
}

/** A value the tool filled in or chose, with its basis and the line it applies to. */
export interface Assumption {
  /** Derived from content, e.g. `default:inside-surface-resistance:EW-1`. */
  readonly id: string;
  readonly text: string;
  readonly source: string;
  /** `path:line:col` */
  readonly at: string;
}

export interface Construction {
  readonly id: string;
  readonly name: string;
  readonly layers: readonly ResolvedLayer[];
  readonly heatFlow: HeatFlowDirection;
  /** R_se, m^2 K/W */
  readonly outsideResistance: number;
  readonly outsideResistanceDefaulted: boolean;
  /** R_si, m^2 K/W */
  readonly insideResistance: number;
  readonly insideResistanceDefaulted: boolean;
  /** s */
  readonly timestepS: number;
  readonly at: Position;
}

export type { TemperatureProfile } from "./temperatureProfile.ts";

/** A site: latitude and longitude in degrees (east positive), standard-time offset from UTC in hours (east positive). */
export interface Site {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly timeZoneH: number;
  readonly elevationM?: number;
}

/** The sky of a design day. */
export type DesignDaySky =
  | { readonly kind: "clear-sky"; readonly beamOpticalDepth: number; readonly diffuseOpticalDepth: number }
  | { readonly kind: "none" };

interface ScenarioCommon {
  readonly id: string;
  readonly timestepS: number;
  readonly timestepDefaulted: boolean;
  readonly indoor: TemperatureProfile;
  readonly surfaces: readonly ScenarioSurface[];
  readonly at: Position;
}

/** A scenario block, validated and in SI. */
export type Scenario =
  | (ScenarioCommon & {
    readonly kind: "design-day";
    readonly outdoor:
      | { readonly kind: "daily-range"; readonly maxDryBulbC: number; readonly dailyRangeK: number }
      | { readonly kind: "hourly"; readonly hourlyC: readonly number[] };
    readonly site?: Site;
    readonly month: number;
    readonly day: number;
    readonly sky: DesignDaySky;
    /** The user's radiant time series, when given: cooling load is computed from it. */
    readonly radiantTimeSeries?: RadiantTimeSeries;
  })
  | (ScenarioCommon & {
    readonly kind: "weather";
    /** Path of the weather CSV inside the project (POSIX). */
    readonly weatherPath: string;
    readonly weatherAt: Position;
    readonly site?: Site;
    /** `period: <n> days` when the file covers a repeating period other than one whole year, s. */
    readonly period?: { readonly seconds: number; readonly at: Position };
    /** Extension: `synthetic: true` (or a note) marks the weather as invented, an open item until issue. */
    readonly synthetic?: { readonly note: string; readonly at: Position };
  });

/**
 * A radiant time series: 24 hourly fractions r_0…r_23 (Σ = 1) given by the user with where they come from, or
 * (`room`) the non-solar series this package generates for a room of the project: then `values` is empty as read
 * and filled in when the room is computed.
 */
export interface RadiantTimeSeries {
  readonly values: readonly number[];
  readonly source: string;
  /** Id of the room whose own non-solar series is used (`radiant-time-series: { room: <id> }`). */
  readonly room?: string;
  readonly at: Position;
}

/**
 * A `kind: heating` scenario block: steady winter design heat loss and ISO 13788 surface checks. Kept apart from
 * the `Scenario` union (which is hourly) so code that walks hourly scenarios is unchanged.
 */
export interface HeatingScenario {
  readonly kind: "heating";
  readonly id: string;
  /** θ_i, °C */
  readonly indoorC: number;
  /** θ_e, design outdoor temperature, °C */
  readonly outdoorC: number;
  /** φ_i, indoor relative humidity as a fraction (0.5 = 50 %) */
  readonly indoorRelativeHumidity: number;
  /** R_si for the surface-temperature checks, m² K/W; absent = the ISO 13788 default (logged). */
  readonly moistureSurfaceResistance?: number;
  readonly surfaces: readonly ScenarioSurface[];
  readonly at: Position;
}

/** An exposed surface of a scenario. Optional keys stay absent here; defaults are filled (and logged) when computing. */
export interface ScenarioSurface {
  readonly id: string;
  readonly construction: string;
  /** m^2 */
  readonly areaM2: number;
  /** degrees clockwise from north */
  readonly azimuthDeg?: number;
  /** degrees from horizontal (0 = facing up) */
  readonly tiltDeg?: number;
  readonly absorptance?: number;
  readonly emittance?: number;
  readonly groundReflectance?: number;
  /** W/(m^2 K) */
  readonly outsideCoefficient?: number;
  /** K: the long-wave term ε ΔR / h_o */
  readonly longwaveCorrectionK?: number;
  readonly radiantFraction?: number;
  /** 24 sol-air temperatures, °C, bypassing the solar model. */
  readonly solAirC?: readonly number[];
  readonly at: Position;
}

/** One piece of a project file in reading order: prose, an input block, or another code block. */
export type Segment =
  | { readonly kind: "prose"; readonly markdown: string; readonly at: Position }
  | {
    readonly kind: "block";
    readonly blockKind: "material" | "construction" | "scenario" | "room";
    /** id read from the block, when it has one */
    readonly id?: string;
    /** the exact fence text, for display */
    readonly source: string;
    readonly at: Position;
  };

export interface ProjectDocument {
  readonly path: string;
  readonly segments: readonly Segment[];
}

/** Everything the engine and the report need, resolved to SI with positions. */
export interface Model {
  readonly info: ProjectInfo;
  readonly documents: readonly ProjectDocument[];
  readonly materials: readonly MaterialDef[];
  readonly constructions: readonly Construction[];
  readonly scenarios: readonly Scenario[];
  readonly assumptions: readonly Assumption[];
  /** `kind: heating` scenario blocks, in reading order (absent when there are none). */
  readonly heatingScenarios?: readonly HeatingScenario[];
  /** `room` blocks, in reading order (absent when there are none). */
  readonly rooms?: readonly Room[];
}

/** Looks up a material id among the project's blocks and the built-in library. */
export interface MaterialLookup {
  find(id: string): MaterialDef | undefined;
  ids(): readonly string[];
  /** True for the id of a material block that has errors of its own (already reported once). */
  isBroken?(id: string): boolean;
}
