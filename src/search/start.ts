/**
 * Where the growth walk begins, and the sentence that says why. A baseline answers the same
 * question only when its result-changing settings match; then most pull requests, which do not
 * change the capacity, need only the baseline's width and the width below it decided.
 */
import type { GrowthMode, SearchStart } from '../config/types.js';

export interface StartChoice {
  /** 'baseline': the walk decides `width` and the width below first; 'min-width': every width from min-width up. */
  from: 'baseline' | 'min-width';
  width: number;
  /** Why the walk starts there, as a sentence fragment ("no baseline yet", ...). */
  why: string;
}

export interface StartFacts {
  start: SearchStart;
  growth: GrowthMode;
  minWidth: number;
  maxWidth: number;
  /** The baseline's width where growth stopped (its grown width, else its answer); null without a baseline. */
  baselineWidth: number | null;
  /** Result-changing settings that differ from the baseline's (empty: the same question). */
  settingsChanged: readonly string[];
}

export function chooseStart(facts: StartFacts): StartChoice {
  const fromMin = (why: string): StartChoice => ({ from: 'min-width', width: facts.minWidth, why });
  if (facts.start === 'min-width') return fromMin('search.start is min-width');
  if (facts.growth === 'in-place') return fromMin('in-place growth grows every network from min-width');
  if (facts.baselineWidth === null) return fromMin('there is no baseline yet');
  if (facts.settingsChanged.length > 0)
    return fromMin("the baseline's settings differ, so it answers another question");
  const width = Math.min(facts.maxWidth, Math.max(facts.minWidth, facts.baselineWidth));
  if (width === facts.minWidth) return fromMin(`the baseline's width ${facts.baselineWidth} is min-width`);
  return { from: 'baseline', width, why: `the baseline has the same settings` };
}
