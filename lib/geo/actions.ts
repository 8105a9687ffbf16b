/**
 * Protective actions that fit in the warning (BRIEF item 9): an action fits when
 * warning ≥ reaction time + the action's seconds (common practice, no source).
 */
import type { ProtectiveAction } from "./exposure";

/** True when `action` can be completed with `warningS` of warning after `reactionS` to start. */
export function actionFits(warningS: number, reactionS: number, action: ProtectiveAction): boolean {
  return warningS >= reactionS + action.seconds;
}

/** The actions (in the given order) that fit in `warningS`; none when the place is not alerted. */
export function actionsThatFit(warningS: number | null, alerted: boolean, reactionS: number, actions: readonly ProtectiveAction[]): ProtectiveAction[] {
  if (!alerted || warningS === null) return [];
  return actions.filter((action) => actionFits(warningS, reactionS, action));
}
