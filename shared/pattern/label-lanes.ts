/**
 * Staggered lanes of horizontal labels: each label goes into the nearest lane where it
 * keeps clear of the labels already there, so labels never overlap and crowded stretches
 * (adjustment holes 6 mm apart) stack while open stretches stay one line.
 */

/** Clear space kept between two labels in one lane, mm. */
export const LANE_GAP_MM = 2.5;

/** A label's extent along the strap, mm. */
export interface LaneSpan {
  minX: number;
  maxX: number;
}

/**
 * Places each label, in the order given, in the lowest lane (0 = nearest the strap) where one
 * of its candidate spans fits; candidates are tried in order within a lane (centred over its
 * feature first, then starting or ending at it), so a label moves sideways before it moves up.
 * Returns the lane and the index of the candidate used.
 */
export function packLanes(candidates: readonly (readonly LaneSpan[])[], gapMm = LANE_GAP_MM): { lane: number; choice: number }[] {
  const lanes: LaneSpan[][] = [];
  const fits = (lane: LaneSpan[] | undefined, s: LaneSpan) => !lane || lane.every((o) => s.maxX + gapMm <= o.minX || s.minX >= o.maxX + gapMm);
  return candidates.map((cands) => {
    for (let i = 0; ; i++) {
      const choice = cands.findIndex((s) => fits(lanes[i], s));
      if (choice >= 0) {
        (lanes[i] ??= []).push(cands[choice]!);
        return { lane: i, choice };
      }
    }
  });
}
