import { type CompressionCurve, type CurveState, loadingStates } from './compression-curve';
import { steepestWindow, virginStart } from './compression-index';
import { fitLine, intersectionX, type Line, lineAt, type Segment, type StressRange } from './geometry';
import { because, cannot, type Derived, determined, shown } from './outcome';
import { type SlopeFit, withinRange } from './slope-fit';

export interface StrainEnergyChoice {
  /** the first-loading points the pre-yield line is fitted to (a steward's choice) */
  preYieldRange?: StressRange;
  /** the first-loading points the post-yield line is fitted to */
  postYieldRange?: StressRange;
}

/** Cumulative work per unit volume against stress: kPa × strain = kJ/m³. */
export interface WorkPoint {
  stressKpa: number;
  workKjPerM3: number;
}

export interface WorkLine {
  points: WorkPoint[];
  range: StressRange;
  /** W = slope·σ′ + intercept (arithmetic axes) */
  line: Line;
  segment: Segment<WorkPoint>;
  chosenBy: 'auto' | 'person';
}

export interface StrainEnergyConstruction {
  sigmaPKpa: number;
  /** (0, 0) and every first-loading point */
  workCurve: WorkPoint[];
  preYield: WorkLine;
  postYield: WorkLine;
  intersection: WorkPoint;
}

/**
 * σ′p by the strain-energy (work) method of Becker, Crooks, Been & Jefferies (1987), "Work as a criterion
 * for determining in situ and yield stresses in clays", Can. Geotech. J. 24(4): 549–564: the work done on
 * the specimen per unit volume, W = Σ ½(σ′ᵢ₋₁ + σ′ᵢ)(εᵢ − εᵢ₋₁), is plotted against σ′ on arithmetic axes; straight lines through the pre-yield and the post-yield points meet at σ′p. Work is
 * summed along the first-loading points (an unload–reload loop on the way is stepped over).
 *
 * Lines chosen automatically: post-yield through the first three points on the virgin line (the line Cc
 * is read from, followed back while points stay on it; see `virginStart`); pre-yield through the
 * last three first-loading points before them that are not yet in the bend (see `trimBend`).
 */
export function strainEnergyPreconsolidation(
  curve: CompressionCurve,
  choice: StrainEnergyChoice = {},
): Derived<StrainEnergyConstruction> {
  const problem = curve.problems.find((p) => p.branch !== 'unloading');
  if (problem) return cannot('sigmaPStrainEnergy', 'goes-backwards', `${problem.message}.`);
  const loading = loadingStates(curve);
  const work = workCurve(loading);
  const window = steepestWindow(loading);
  if (!window.ok && !choice.postYieldRange) return because('sigmaPStrainEnergy', window);
  const firstVirgin = window.ok ? virginStart(loading, window.value) : 0;
  const post = choice.postYieldRange ? pick(loading, work, choice.postYieldRange) : work.slice(firstVirgin + 1, firstVirgin + 4);
  if (post.length < 2) return cannot('sigmaPStrainEnergy', 'too-few-points', 'the post-yield line needs at least 2 points.');
  const postLine = fitWork(post);
  const firstPost = post[0] as WorkPoint;
  const candidates = choice.preYieldRange
    ? pick(loading, work, choice.preYieldRange)
    : atStresses(
        work,
        trimBend(
          loading.filter((p) => p.stressKpa < firstPost.stressKpa),
          window.ok ? window.value.fit : null,
        ),
      );
  const pre = choice.preYieldRange ? candidates : candidates.slice(-PRE_YIELD_POINTS);
  const preLine = pre.length >= 2 ? fitWork(pre) : null;
  if (!preLine) {
    return cannot(
      'sigmaPStrainEnergy',
      'too-few-points',
      `the test has ${pre.length} first-loading point(s) before yield; the pre-yield line needs 2.`,
    );
  }
  const x = intersectionX(preLine, postLine);
  const lo = (pre[0] as WorkPoint).stressKpa;
  const hi = (post[post.length - 1] as WorkPoint).stressKpa;
  if (x === null || !(postLine.slope > preLine.slope) || x < lo || x > hi) {
    return cannot(
      'sigmaPStrainEnergy',
      'no-intersection',
      `the pre- and post-yield lines do not meet between ${shown(lo)} and ${shown(hi)} kPa.`,
    );
  }
  const line = (points: WorkPoint[], fit: Line, chosenBy: WorkLine['chosenBy'], from: number, to: number): WorkLine => ({
    points,
    range: { fromKpa: (points[0] as WorkPoint).stressKpa, toKpa: (points[points.length - 1] as WorkPoint).stressKpa },
    line: { slope: fit.slope, intercept: fit.intercept },
    segment: { from: { stressKpa: from, workKjPerM3: lineAt(fit, from) }, to: { stressKpa: to, workKjPerM3: lineAt(fit, to) } },
    chosenBy,
  });
  return determined({
    sigmaPKpa: x,
    workCurve: work,
    preYield: line(pre, preLine, choice.preYieldRange ? 'person' : 'auto', 0, Math.max(x, ...pre.map((p) => p.stressKpa))),
    postYield: line(post, postLine, choice.postYieldRange ? 'person' : 'auto', Math.min(x, (post[0] as WorkPoint).stressKpa), hi),
    intersection: { stressKpa: x, workKjPerM3: lineAt(postLine, x) },
  });
}

/** W at (0, 0) and at every first-loading point: W = Σ ½(σ′ᵢ₋₁ + σ′ᵢ)(εᵢ − εᵢ₋₁), Becker et al. (1987). */
export function workCurve(loading: readonly CurveState[]): WorkPoint[] {
  const out: WorkPoint[] = [{ stressKpa: 0, workKjPerM3: 0 }];
  let stress = 0;
  let strain = 0;
  let work = 0;
  for (const s of loading) {
    work += ((stress + s.stressKpa) / 2) * (s.strain - strain);
    stress = s.stressKpa;
    strain = s.strain;
    out.push({ stressKpa: stress, workKjPerM3: work });
  }
  return out;
}

function fitWork(points: readonly WorkPoint[]) {
  return fitLine(
    points.map((p) => p.stressKpa),
    points.map((p) => p.workKjPerM3),
  );
}

function pick(loading: readonly CurveState[], work: readonly WorkPoint[], range: StressRange): WorkPoint[] {
  return atStresses(work, withinRange(loading, range));
}

function atStresses(work: readonly WorkPoint[], states: readonly CurveState[]): WorkPoint[] {
  const stresses = new Set(states.map((s) => s.stressKpa));
  return work.filter((p) => p.stressKpa > 0 && stresses.has(p.stressKpa));
}

/** common practice (our own rule): the pre-yield line is drawn through the last three points before the bend */
const PRE_YIELD_POINTS = 3;
/** common practice (our own rule): a point has entered the bend when it falls below the line through the two points before it by a tenth of what the virgin slope would add */
const BEND_SHARE = 0.1;

/**
 * Drops trailing first-loading points that are already in the bend towards the virgin line, judged on the
 * e–log σ′ curve: a point is in the bend when its void ratio lies below the straight line through the two
 * points before it by more than BEND_SHARE of the extra fall the virgin slope (Cc) would give over that
 * step, and nearer the virgin line than that line (a steepening far from the virgin line, such as the
 * end of reloading at σ′v0, is not yield).
 */
function trimBend(states: readonly CurveState[], virgin: SlopeFit | null): CurveState[] {
  let end = states.length;
  while (virgin && end > 2) {
    const [a, b, c] = states.slice(end - 3, end) as [CurveState, CurveState, CurveState];
    const slope = (a.voidRatio - b.voidRatio) / Math.log10(b.stressKpa / a.stressKpa);
    const step = Math.log10(c.stressKpa / b.stressKpa);
    const drop = b.voidRatio - slope * step - c.voidRatio;
    const fromVirgin = Math.abs(c.voidRatio - lineAt(virgin.line, Math.log10(c.stressKpa)));
    if (drop > BEND_SHARE * Math.max(virgin.value - slope, 0) * step && fromVirgin < drop) end--;
    else break;
  }
  return states.slice(0, end);
}
