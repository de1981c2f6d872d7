import { describe, expect, it } from 'vitest';
import { secureWebPreferences, securityViolations } from './web-preferences.js';

describe('window web preferences', () => {
  it('the shared preferences satisfy every required security setting', () => {
    expect(securityViolations(secureWebPreferences('/app/preload.cjs'))).toEqual([]);
  });

  it('flags each weakened setting by name', () => {
    const weakened = { ...secureWebPreferences('/p.cjs'), sandbox: false, nodeIntegration: true };
    expect(securityViolations(weakened)).toEqual(['nodeIntegration must be false (is true)', 'sandbox must be true (is false)']);
    expect(securityViolations(undefined)).toContain('contextIsolation must be true (is undefined)');
  });
});
