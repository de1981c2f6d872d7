import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CONTENT_SECURITY_POLICY } from './content-security-policy.js';

describe('content security policy', () => {
  it('allows no remote origins, no eval and no inline scripts', () => {
    expect(CONTENT_SECURITY_POLICY).toContain("default-src 'none'");
    expect(CONTENT_SECURITY_POLICY).toContain("script-src 'self'");
    expect(CONTENT_SECURITY_POLICY).not.toMatch(/unsafe-eval|unsafe-inline|https?:|\*/);
  });

  it('is the policy written into the renderer page', () => {
    const html = readFileSync(new URL('../../renderer/index.html', import.meta.url), 'utf8');
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}"`);
  });
});
