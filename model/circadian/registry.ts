/**
 * Pacemaker models selectable by id. The default set for the product is `jfk99-x7` (the oscillator
 * the St Hilaire melatonin model was fitted with); the others form a small ensemble.
 */
import { createFjkCubic } from './fjk-cubic.js';
import { createHannaySp } from './hannay-sp.js';
import { createJfkX7 } from './jfk-x7.js';
import type { Pacemaker, PersonParams } from './pacemaker.js';

export const PACEMAKER_IDS = ['jfk99-x7', 'fjk99-cubic', 'fjk99-cubic-sf14', 'hfb19-sp'] as const;
export type PacemakerId = (typeof PACEMAKER_IDS)[number];
export const DEFAULT_PACEMAKER_ID: PacemakerId = 'jfk99-x7';

export function isPacemakerId(id: string): id is PacemakerId {
  return (PACEMAKER_IDS as readonly string[]).includes(id);
}

export function createPacemaker(id: PacemakerId, person: PersonParams = {}): Pacemaker {
  switch (id) {
    case 'jfk99-x7':
      return createJfkX7(person);
    case 'fjk99-cubic':
      return createFjkCubic(person, 'f99');
    case 'fjk99-cubic-sf14':
      return createFjkCubic(person, 'sf14');
    case 'hfb19-sp':
      return createHannaySp(person);
  }
}
