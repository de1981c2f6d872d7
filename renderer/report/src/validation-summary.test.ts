import { describe, expect, it } from 'vitest';
import { summariseValidationRecord } from './validation-summary.js';

const RECORD = `# Sun and daylight — validation record

Intro text with a | pipe.

| what | source | tolerance | result |
|---|---|---|---|
| **zenith** at noon | NREL SPA Table A5.2 | ±0.0003° | 50.11162° |
| \`azimuth\` a \\| b | same | ±0.0003° | 194.34024° |

Other table:

| model | unit |
|---|---|
| x | lx |

| what | source | tolerance | result (relative) |
|---|---|---|---|
| third | handbook | 1e-3 | 1e-15 |
| fourth | handbook | 1e-3 | 2e-15 |
`;

describe('validation record summary', () => {
  it('counts the check rows of every "what | source | tolerance | result" table and nothing else', () => {
    const s = summariseValidationRecord('sun.md', RECORD, 3);
    expect(s.title).toBe('Sun and daylight');
    expect(s.checks).toBe(4);
  });

  it('quotes the first checks as written, without Markdown marks', () => {
    const s = summariseValidationRecord('sun.md', RECORD, 3);
    expect(s.examples.map((e) => e.what)).toEqual(['zenith at noon', 'azimuth a | b', 'third']);
    expect(s.examples[0]).toEqual({ what: 'zenith at noon', source: 'NREL SPA Table A5.2', result: '50.11162°' });
  });

  it('takes the title after a "Validation record:" prefix', () => {
    expect(summariseValidationRecord('x.md', '# Validation record: scenarios and rosters\n').title).toBe('Scenarios and rosters');
  });
});
