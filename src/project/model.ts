import type { Layer } from "../engine/layer.ts";
import type { Position } from "./position.ts";

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
};

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

/** A temperature given as one constant or as 24 hourly values (index k = k:00 local standard time), °C. */
export type TemperatureProfile =
  | { readonly kind: "constant"; readonly valueC: number }
  | { readonly kind: "hourly"; readonly hourlyC: readonly number[] };

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
  })
  | (ScenarioCommon & {
    readonly kind: "weather";
    /** Path of the weather CSV inside the project (POSIX). */
    readonly weatherPath: string;
    readonly weatherAt: Position;
    readonly site?: Site;
  });

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
    readonly blockKind: "material" | "construction" | "scenario";
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
}
