import { erfc } from './special-functions';

/**
 * Excess pore pressure ratio u(z,t)/u0 in a single layer with uniform initial excess pore
 * pressure u0, at Z = z/Hdr measured from the drainage face (0 ≤ Z ≤ 2 for two-way drainage,
 * 0 ≤ Z ≤ 1 for one-way drainage with the impervious base at Z = 1), time factor Tv ≥ 0.
 *
 * Tv ≥ 0.05: Fourier series u/u0 = Σ (2/M)·sin(MZ)·exp(−M²Tv), M = π(2m+1)/2 (Terzaghi 1943;
 * chart form in UFC 3-220-10 Fig. 5-17). Tv < 0.05: the equivalent image series of erfc terms
 * (method of images, Carslaw & Jaeger 1959 §3.3), which converges in a few terms at small Tv.
 */
export function excessPorePressureRatio(z: number, tv: number): number {
  const Z = z > 1 ? 2 - z : z;
  if (Z <= 0) return 0;
  if (!(tv > 0)) return 1;
  if (tv < 0.05) {
    const s = 2 * Math.sqrt(tv);
    let drained = 0;
    for (let n = 0; n < 20; n++) {
      const sign = n % 2 === 0 ? 1 : -1;
      const a = erfc((2 * n + Z) / s);
      const b = erfc((2 * n + 2 - Z) / s);
      drained += sign * (a + b);
      if (a + b < 1e-17) break;
    }
    return 1 - drained;
  }
  let sum = 0;
  for (let m = 0; m < 10000; m++) {
    const M = (Math.PI * (2 * m + 1)) / 2;
    const decay = Math.exp(-M * M * tv);
    sum += (2 / M) * Math.sin(M * Z) * decay;
    if (decay < 1e-17) break;
  }
  return sum;
}
