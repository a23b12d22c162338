export type DecisionName = 'conforming' | 'needs_annealing' | 'undecided' | 'no_readings';

// Words first, colour second: the badge must read right in grey print and for colour-blind eyes.
export const DECISION_WORDING: Record<DecisionName, string> = {
  conforming: 'Fit to test',
  needs_annealing: 'Anneal first',
  undecided: 'Undecided within uncertainty',
  no_readings: 'Not yet read',
};

export function DecisionBadge({ decision }: { decision: DecisionName }) {
  return <span class={`badge badge-${decision.replace('_', '-')}`}>{DECISION_WORDING[decision]}</span>;
}
