/**
 * The result quantities of rooms (results.json `rooms.<id>`) that `diff` compares, in the shape of the scenario
 * comparison: per room the heat balance peak and its hour, the radiant time series method peak and its hour, the
 * design heat loss and the heat loss coefficient; per room surface the highest inside surface temperature.
 */
import type { ResultsJson } from "../results/types.ts";
import type { RoomResults } from "../scenarios/room/roomTypes.ts";
import type { ComparedQuantity } from "./types.ts";

function finite(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

/** The rooms of a results.json, whatever other keys it holds (an older results.json has none). */
export function roomsOf(results: ResultsJson): Readonly<Record<string, RoomResults>> {
  const rooms: unknown = (results as unknown as Readonly<Record<string, unknown>>).rooms;
  return typeof rooms === "object" && rooms !== null ? rooms as Readonly<Record<string, RoomResults>> : {};
}

function highest(series: unknown): number | null {
  if (!Array.isArray(series) || series.length === 0) return null;
  const values = series.map(finite);
  return values.every((v): v is number => v !== null) ? Math.max(...values) : null;
}

/** The compared quantities of one room. */
export function roomQuantities(id: string, r: RoomResults): ComparedQuantity[] {
  const subject = `room:${id}`;
  const cooling = r.coolingLoad;
  return [
    {
      subject,
      quantity: "heatBalancePeak",
      unit: "W",
      value: finite(cooling?.heatBalancePeak?.load),
      ratio: true,
    },
    {
      subject,
      quantity: "heatBalancePeakTime_h",
      unit: "h",
      value: finite(cooling?.heatBalancePeak?.time_h),
      ratio: false,
      clock: true,
    },
    {
      subject,
      quantity: "rtsMethodPeak",
      unit: "W",
      value: finite(cooling?.rtsMethodPeak?.load),
      ratio: true,
    },
    {
      subject,
      quantity: "rtsMethodPeakTime_h",
      unit: "h",
      value: finite(cooling?.rtsMethodPeak?.time_h),
      ratio: false,
      clock: true,
    },
    { subject, quantity: "designHeatLoss", unit: "W", value: finite(r.heating?.total), ratio: true },
    {
      subject,
      quantity: "heatLossCoefficient",
      unit: "W/K",
      value: finite(r.heatLossCoefficient),
      ratio: true,
    },
    ...Object.entries(r.surfaces ?? {}).map(([surfaceId, s]): ComparedQuantity => ({
      subject: `${subject}/${surfaceId}`,
      quantity: "peakInsideSurfaceTemperature",
      unit: "°C",
      value: highest(s.insideSurfaceTemperature),
      ratio: false,
    })),
  ];
}
