import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { addLuminaire, addPlace, luminaireReferences, placeReferences, placeUsers, removeLuminaire, removePlace } from './place-edits.js';
import { addChange, addStrategy, changeTargets, newChange, removeChange } from './strategy-edits.js';

const demo = () => structuredClone(DEMO_SCENARIO);
const errors = (value: unknown) => validateScenarioValue(value).problems.filter((p) => p.severity === 'error');

describe('adding and removing places and luminaires', () => {
  it('adds a room, a vehicle and an outdoor place with free ids, and the scenario stays valid', () => {
    let s = demo();
    for (const kind of ['room', 'vehicle', 'outdoors'] as const) s = addPlace(s, kind);
    expect(s.places.slice(-3).map((p) => [p.kind, p.id])).toEqual([
      ['room', 'room-1'],
      ['vehicle', 'vehicle-1'],
      ['outdoors', 'outdoors-1'],
    ]);
    expect(addPlace(s, 'room').places.at(-1)?.id).toBe('room-2');
    expect(errors(s)).toEqual([]);
  });

  it('removes a place nobody uses, and keeps one still named by a person or a strategy', () => {
    const s = addPlace(demo(), 'room');
    expect(removePlace(s, 'room-1').places).toHaveLength(demo().places.length);
    const used = demo().places.find((p) => p.id === 'office-floor')!;
    expect(placeReferences(demo(), used.id).length).toBeGreaterThan(0);
    expect(removePlace(demo(), used.id)).toEqual(demo());
  });

  it('adds a luminaire to a room and removes it again; a luminaire a strategy changes stays', () => {
    const s = addLuminaire(demo(), 'office-floor');
    const room = s.places.find((p) => p.id === 'office-floor');
    const added = room?.kind === 'room' ? room.luminaires?.at(-1) : undefined;
    expect(added?.id).toBe('luminaire-1');
    expect(errors(s)).toEqual([]);
    expect(removeLuminaire(s, 'office-floor', 'luminaire-1')).toEqual({ ...s, places: demo().places });
    expect(luminaireReferences(demo(), 'office-floor', 'panels').length).toBeGreaterThan(0);
    expect(removeLuminaire(demo(), 'office-floor', 'panels')).toEqual(demo());
  });
});

describe('adding and removing strategy changes', () => {
  it('adds each kind of change for a valid target and the scenario stays valid', () => {
    for (const kind of ['set-luminaire', 'add-luminaire', 'remove-luminaire', 'set-blinds'] as const) {
      const target = changeTargets(demo(), kind)[0]!;
      const change = newChange(demo(), kind, target.value)!;
      const s = addChange(demo(), 'ward-bright-night-start', change);
      expect(s.strategies?.find((x) => x.id === 'ward-bright-night-start')?.changes).toHaveLength(2);
      expect(errors(s)).toEqual([]);
    }
    expect(newChange(demo(), 'set-luminaire', 'nowhere/nothing')).toBeNull();
  });

  it('removes a change but never the last one of a strategy', () => {
    const target = changeTargets(demo(), 'set-blinds')[0]!;
    const s = addChange(demo(), 'ward-bright-night-start', newChange(demo(), 'set-blinds', target.value)!);
    const back = removeChange(s, 'ward-bright-night-start', 1);
    expect(back.strategies).toEqual(demo().strategies);
    expect(removeChange(back, 'ward-bright-night-start', 0).strategies).toEqual(demo().strategies);
  });

  it('adds a new strategy with one first change that passes the format checks', () => {
    const s = addStrategy(demo());
    expect(s.strategies?.at(-1)).toMatchObject({ id: 'strategy-1', name: 'New strategy 1' });
    expect(s.strategies?.at(-1)?.changes).toHaveLength(1);
    expect(errors(s)).toEqual([]);
  });
});

describe('who uses a place', () => {
  it('names the people and strategies, not paths', () => {
    const users = placeUsers(demo(), 'office-floor');
    expect(users).toContain('Tove Arnhelm (invented)');
    expect(users.some((u) => u.startsWith('strategy “'))).toBe(true);
    expect(placeUsers(addPlace(demo(), 'room'), 'room-1')).toEqual([]);
  });
});
