// Content-Security-Policy for the renderer: only the app's own scripts, styles, workers and
// images; no remote origins, no eval, no plugins. (frame-ancestors is ignored in a meta tag;
// the web-mode server adds it as a header.) The same string is written into
// renderer/index.html (meta tag, checked by a test) and sent by the web-mode server as a header.
export const CONTENT_SECURITY_POLICY = [
  "default-src 'none'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');
