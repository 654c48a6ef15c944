/** Largest value and its step index (the first, on ties). */
export function peakOf(values: readonly number[]): { value: number; index: number } {
  let index = 0;
  for (let k = 1; k < values.length; k++) if (values[k]! > values[index]!) index = k;
  return { value: values[index] ?? NaN, index };
}

/** Arithmetic mean. */
export function meanOf(values: readonly number[]): number {
  return values.reduce((a, b) => a + b, 0) / values.length;
}

/** Energy of the positive and of the negative part of a power series, J, for steps of `timestepS`. */
export function gainAndLoss(
  powerW: readonly number[],
  timestepS: number,
): { gain_J: number; loss_J: number } {
  let gain = 0;
  let loss = 0;
  for (const p of powerW) {
    if (p > 0) gain += p * timestepS;
    else loss -= p * timestepS;
  }
  return { gain_J: gain, loss_J: loss };
}

/** Element-wise sum of equally long series. */
export function sumSeries(series: readonly (readonly number[])[], length: number): number[] {
  const total = new Array<number>(length).fill(0);
  for (const s of series) for (let k = 0; k < length; k++) total[k] = total[k]! + (s[k] ?? 0);
  return total;
}
