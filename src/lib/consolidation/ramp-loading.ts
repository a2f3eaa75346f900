/**
 * Consolidation under a load that rises linearly from 0 at t = 0 to its full value at the end of
 * construction tc and then stays constant.
 */
import { integratedDegree } from './terzaghi';

/**
 * Average degree of consolidation relative to the final load for a single layer under ramp
 * loading, Tv ≥ 0 and Tc = cv·tc/Hdr² > 0 (dimensionless):
 * T ≤ Tc: U = (T/Tc)·[1 − (2/T)·Σ(1 − e^(−M²T))/M⁴];
 * T ≥ Tc: U = 1 − (2/Tc)·Σ(e^(−M²(T−Tc)) − e^(−M²T))/M⁴.
 * Both are (1/Tc)·∫ U_step over the loading window, which is how they are evaluated here
 * (`integratedDegree`, with its closed small-Tv form). Source: Olson (1977) J. Geotech. Eng. Div.
 * 103(GT1):55–60; UFC 3-220-10 Fig. 5-20.
 */
export function olsonRampDegree(tv: number, tvConstruction: number): number {
  if (!(tv > 0)) return 0;
  if (tv <= tvConstruction) return integratedDegree(tv) / tvConstruction;
  return (integratedDegree(tv) - integratedDegree(tv - tvConstruction)) / tvConstruction;
}

const GL_NODES = [
  -0.9894009349916499, -0.9445750230732326, -0.8656312023878318, -0.755404408355003, -0.6178762444026438, -0.45801677765722737,
  -0.2816035507792589, -0.09501250983763744, 0.09501250983763744, 0.2816035507792589, 0.45801677765722737, 0.6178762444026438,
  0.755404408355003, 0.8656312023878318, 0.9445750230732326, 0.9894009349916499,
];
const GL_WEIGHTS = [
  0.027152459411754096, 0.062253523938647894, 0.09515851168249279, 0.12462897125553388, 0.14959598881657674, 0.16915651939500254,
  0.18260341504492358, 0.1894506104550685, 0.1894506104550685, 0.18260341504492358, 0.16915651939500254, 0.14959598881657674,
  0.12462897125553388, 0.09515851168249279, 0.062253523938647894, 0.027152459411754096,
];

/**
 * Ramp response from any step response by Duhamel superposition (linear theory):
 * U_ramp(t) = (1/tc)·∫ U_step(s) ds over s from max(0, t − tc) to t. Evaluated with 16-point
 * Gauss–Legendre after the substitution s = a + (t − a)·w², which removes the √s behaviour of
 * U_step at the start of loading. t and tc in years (tc > 0).
 * Source: Duhamel's principle as used by Olson (1977).
 */
export function rampFromStep(stepDegree: (timeYears: number) => number, timeYears: number, constructionYears: number): number {
  if (!(timeYears > 0)) return 0;
  const start = Math.max(0, timeYears - constructionYears);
  const span = timeYears - start;
  let sum = 0;
  for (let i = 0; i < GL_NODES.length; i++) {
    const w = 0.5 * ((GL_NODES[i] as number) + 1);
    sum += (GL_WEIGHTS[i] as number) * stepDegree(start + span * w * w) * w;
  }
  return (sum * span) / constructionYears;
}
