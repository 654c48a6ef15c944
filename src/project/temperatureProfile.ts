/** A temperature given as one constant or as 24 hourly values (index k = k:00 local standard time), °C. */
export type TemperatureProfile =
  | { readonly kind: "constant"; readonly valueC: number }
  | { readonly kind: "hourly"; readonly hourlyC: readonly number[] };
