/**
 * The room: sensible cooling load by the inside-face heat balance, the room's own radiant time series and the
 * radiant time series method load beside it. Pure functions of plain series (SI); no project or climate types.
 */
export type {
  FarSide,
  RadiantSplit,
  RoomGainInput,
  RoomInput,
  RoomOptions,
  RoomSurfaceInput,
  RoomWindowInput,
  SurfaceOrientation,
} from "./roomInput.ts";
export { DEFAULT_CONVECTION, DEFAULT_RADIANT_SPLIT } from "./roomInput.ts";
export type { RoomFailure } from "./insideSurfaces.ts";
export type { RoomNote } from "./roomNotes.ts";
export { type FaceResult, type HeatBalanceResult, roomHeatBalance } from "./heatBalance.ts";
export type { LoadSource } from "./loadSources.ts";
export {
  type RadiantTimeSeries,
  roomRadiantTimeSeries,
  roomRtsMethod,
  type RtsMethodResult,
} from "./radiantTimeSeries.ts";
export { type RoomCoolingLoad, roomCoolingLoad } from "./coolingLoad.ts";
