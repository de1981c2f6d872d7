// The scenario types the workspace edits: the file as written (inputs, defaults not filled in),
// straight from the scenario format in schedules/.
import type { ScenarioInput, SegmentInput } from '../../../schedules/schema/scenario-types.js';
import type { Weekday } from '../../../schedules/schema/primitives.js';

export type { ScenarioInput, SegmentInput, Weekday };
export type PersonaInput = ScenarioInput['personas'][number];
export type PlaceInput = ScenarioInput['places'][number];
export type StrategyInput = NonNullable<ScenarioInput['strategies']>[number];
export type StrategyChangeInput = StrategyInput['changes'][number];
