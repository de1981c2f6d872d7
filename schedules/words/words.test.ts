import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import type { PersonaResult } from '../run/results-types.js';
import { blindsWords, compassWords, directionOfShift, changeWords, placeWords, scheduleWords, seatComparisonSentence, seatPairs, shiftInWords, signedShift, weekdaysWords, workPlaces } from './index.js';
import { bodyClockModelWords, melatoninModelWords, sleepinessModelWords } from './model-words.js';
import { pacemakerCitation, sleepinessCitation, melatoninCitation } from '../../model/circadian/model-citations.js';

const strategy = (id: string) => {
  const s = DEMO_SCENARIO.strategies?.find((x) => x.id === id);
  if (s === undefined) throw new Error(id);
  return s;
};

describe('plain words for the format’s values', () => {
  it('say weekdays as a reader would', () => {
    expect(weekdaysWords(['mon', 'tue', 'wed', 'thu', 'fri'])).toBe('Monday to Friday');
    expect(weekdaysWords(['sun', 'sat'])).toBe('at weekends');
    expect(weekdaysWords(['mon', 'thu'])).toBe('on Mondays and Thursdays');
    expect(weekdaysWords(undefined)).toBe('every day');
  });

  it('say a luminaire schedule with levels, colour temperatures and days', () => {
    expect(scheduleWords([])).toBe('switched off');
    expect(scheduleWords([{ start: '07:00', end: '13:00', level: 1, cct_K: 6000, days: ['mon', 'tue', 'wed', 'thu', 'fri'] }, { start: '13:00', end: '19:00', level: 0.7, days: ['mon', 'tue', 'wed', 'thu', 'fri'] }])).toBe(
      'on 07:00–13:00 at full output and 6000 K, 13:00–19:00 at 70 %, Monday to Friday',
    );
  });

  it('say how blinds are used without the rule’s name', () => {
    const text = blindsWords({ rule: 'manual-sun', loweredTransmittance: 0.2 });
    expect(text).toBe('blinds lowered by hand when the sun reaches the desk and raised again on the next arrival, letting 20 % of daylight through when down');
    expect(text).not.toContain('manual-sun');
  });

  it('give the nearest of eight compass points', () => {
    expect([0, 95, 175, 265, 350].map(compassWords)).toEqual(['north', 'east', 'south', 'west', 'north']);
  });
});

describe('strategy changes in plain words', () => {
  it('name the light, the place and the person as the scenario names them', () => {
    expect(changeWords(DEMO_SCENARIO, strategy('ward-bright-night-start').changes[0]!)).toBe(
      "Adds a light, Bright 6500 K panel, in Hollowmere General, ward Birch, nurses' station: 6500 K, 1000 lx at the eye at full output, on 22:00–01:30 at full output.",
    );
    expect(changeWords(DEMO_SCENARIO, strategy('ward-amber-drive-home').changes[0]!)).toBe('Mara Quellbrook wears amber glasses that block blue light on the journey home after night shifts.');
    expect(changeWords(DEMO_SCENARIO, strategy('office-dim-evening').changes[2]!)).toBe('Tove Arnhelm puts the screen away and looks around the room in free time from 21:00 to 23:00.');
  });

  it('describe a place by what matters for light, with the seat modelled', () => {
    const deep = DEMO_SCENARIO.places.find((p) => p.id === 'office-floor-deep')!;
    expect(placeWords(deep)).toMatch(/^Room 30 × 20 m, 2\.9 m high, 1 window facing south; the seat modelled is 15 m from the window wall; lights: Suspended 4000 K ceiling panels \(250 lx at the eye at full output\)/);
  });
});

describe('the sign of a body-clock shift', () => {
  it('writes + for later and − for earlier, and reads the direction back from numbers and words', () => {
    expect(signedShift(1.449)).toBe('+1.45');
    expect(signedShift(-0.66)).toBe('−0.66');
    expect(signedShift(-0.001)).toBe('0.00');
    expect(shiftInWords(1.45)).toBe('1.4 h later');
    expect(shiftInWords(-0.66)).toBe('0.7 h earlier');
    expect(shiftInWords(0.02)).toBe('no shift');
    expect(['+1.45', '1.4 h later', 'runs 0.7 h later than'].map(directionOfShift)).toEqual(['later', 'later', 'later']);
    expect(['−0.66', '0.7 h earlier'].map(directionOfShift)).toEqual(['earlier', 'earlier']);
  });
});

describe('models in words', () => {
  it('take each citation from the model registry', () => {
    expect(bodyClockModelWords('hfb19-sp').citation).toBe(pacemakerCitation('hfb19-sp'));
    expect(sleepinessModelWords('tpm-kss').citation).toBe(sleepinessCitation('tpm-kss'));
    expect(melatoninModelWords().citation).toBe(melatoninCitation());
  });
});

describe('two desks in one room', () => {
  it('are found from the people’s work places: the same room from seats 2 m and 15 m from the windows', () => {
    expect(workPlaces(DEMO_SCENARIO, DEMO_SCENARIO.personas.find((p) => p.id === 'deep-desk-worker')!)[0]).toBe('office-floor-deep');
    expect(seatPairs(DEMO_SCENARIO)).toEqual([{ personaIds: ['desk-worker', 'deep-desk-worker'], distances_m: [2, 15] }]);
  });

  it('are compared by daytime light under the baseline and under the strategies whose effect differs most', () => {
    const person = (id: string, daytime: Record<string, number>): PersonaResult =>
      ({ id, name: id, strategies: Object.entries(daytime).map(([s, h]) => ({ id: s, name: s === 'baseline' ? 'Baseline' : `Plan ${s}`, is_baseline: s === 'baseline', summary: { mean_daytime_hours_ge_250_lx: h } })) }) as unknown as PersonaResult;
    const names = new Map([['near', 'Ann Near (invented)'], ['far', 'Bo Far']]);
    const sentence = seatComparisonSentence({ personaIds: ['near', 'far'], distances_m: [2, 15] }, names, { personas: [person('near', { baseline: 10.6, a: 10.6, b: 10.4 }), person('far', { baseline: 8.7, a: 10.5, b: 6.6 })] });
    expect(sentence).toBe(
      'Ann Near and Bo Far work in the same room at desks 2 m and 15 m from the windows. Under the baseline Ann Near has 10.6 h a day of light at the eye at 250 lx melanopic EDI or more and Bo Far 8.7 h. ' +
        '“Plan b” gives 2 h 06 min a day less for Bo Far and about the same for Ann Near; “Plan a” gives 1 h 48 min a day more for Bo Far and about the same for Ann Near. ' +
        'Deep in the room daylight runs short, so the electric light decides what reaches the eye; by the windows daylight does.',
    );
  });
});
