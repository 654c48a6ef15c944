import { type HeatBalanceResult, roomHeatBalance } from "./heatBalance.ts";
import type { RoomFailure } from "./insideSurfaces.ts";
import {
  type RadiantTimeSeries,
  roomRadiantTimeSeries,
  roomRtsMethod,
  type RtsMethodResult,
} from "./radiantTimeSeries.ts";
import type { RoomInput } from "./roomInput.ts";

/** Both cooling loads of a room and their difference hour by hour. */
export interface RoomCoolingLoad {
  readonly kind: "room-cooling-load";
  readonly heatBalance: HeatBalanceResult;
  readonly radiantTimeSeries: RadiantTimeSeries;
  readonly rtsMethod: RtsMethodResult;
  /** Radiant time series method minus heat balance at hours 0 … 23 (the heat balance sampled at whole hours), W. */
  readonly differenceW: readonly number[];
  /** (RTS-method peak − heat balance peak) / heat balance peak. */
  readonly peakDifference: number;
}

/** Heat balance load, the room's own radiant time series and the radiant time series method load. */
export function roomCoolingLoad(room: RoomInput): RoomCoolingLoad | RoomFailure {
  const heatBalance = roomHeatBalance(room);
  if (heatBalance.kind !== "heat-balance") return heatBalance;
  const radiantTimeSeries = roomRadiantTimeSeries(room);
  if (radiantTimeSeries.kind !== "radiant-time-series") return radiantTimeSeries;
  const rtsMethod = roomRtsMethod(room, radiantTimeSeries);
  if (rtsMethod.kind !== "rts-method") return rtsMethod;
  const stride = 3600 / room.timestepS;
  const differenceW = rtsMethod.loadW.map((v, h) => v - heatBalance.loadW[h * stride]!);
  return {
    kind: "room-cooling-load",
    heatBalance,
    radiantTimeSeries,
    rtsMethod,
    differenceW,
    peakDifference: (rtsMethod.peak.loadW - heatBalance.peak.loadW) / heatBalance.peak.loadW,
  };
}
