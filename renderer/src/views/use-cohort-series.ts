// The finished cohort's body clocks for one person, by strategy, when the cohort ran on the
// scenario as it is now (else null): what the Body clock and Melatonin charts draw bands from.
import { useMemo, useSyncExternalStore } from 'react';
import { useController, useWorkspace } from '../state/workspace-context.js';
import { MIN_BAND_OCCUPANTS, type OccupantBodyClock } from '../charts/cohort-bands.js';

export interface CohortSeries {
  readonly byStrategy: Readonly<Record<string, readonly OccupantBodyClock[]>>;
  /** Occupants the bands are drawn from. */
  readonly occupants: number;
  readonly seed: number;
}

export function useCohortSeries(personaId: string): CohortSeries | null {
  const controller = useController();
  const present = useWorkspace().history.present;
  const cohort = useSyncExternalStore(controller.cohort.subscribe, controller.cohort.getSnapshot);
  return useMemo(() => {
    if (cohort.status !== 'done' || cohort.scenario !== present) return null;
    const persona = cohort.outcome.personas.find((p) => p.personaId === personaId);
    if (persona === undefined || persona.series.length < MIN_BAND_OCCUPANTS) return null;
    const byStrategy: Record<string, OccupantBodyClock[]> = {};
    for (const occupant of persona.series) for (const [id, s] of Object.entries(occupant)) (byStrategy[id] ??= []).push(s);
    return { byStrategy, occupants: persona.series.length, seed: cohort.settings.seed };
  }, [cohort, present, personaId]);
}
