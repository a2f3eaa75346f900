/**
 * The 2:1 (two vertical to one horizontal) load-spread approximation: the load is spread over an
 * area growing by z in each plan dimension, giving the average Δσz below the loaded area.
 * Crude near the surface (it underestimates the centreline stress of Boussinesq, e.g. 0.444q vs
 * 0.701q at z = B/2 below a square) and meant only for quick checks. Source: common practice;
 * formula q·B·L/((B+z)(L+z)) from memory; UFC 3-220-10 Ch. 4 covers the method.
 */

export type TwoToOneShape = 'rectangle' | 'strip' | 'circle';

/**
 * Average Δσz (kPa) at depth z ≥ 0 (m) for a rectangle B×L (q·B·L/((B+z)(L+z))), a strip of
 * width B (q·B/(B+z)) or a circle of diameter D (q·D²/(D+z)²); sizes in m, q in kPa.
 */
export function twoToOneStressKpa(
  pressureKpa: number,
  shape: TwoToOneShape,
  widthM: number,
  lengthM: number,
  depthM: number,
): number {
  const z = Math.max(0, depthM);
  if (shape === 'strip') return (pressureKpa * widthM) / (widthM + z);
  if (shape === 'circle') return (pressureKpa * widthM * widthM) / ((widthM + z) * (widthM + z));
  return (pressureKpa * widthM * lengthM) / ((widthM + z) * (lengthM + z));
}
