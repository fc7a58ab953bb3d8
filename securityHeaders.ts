// The HTTP headers the app is served with (`npm start`, through vite preview) and that a static host should
// send (README §Serving it yourself). The policy is index.html's Content-Security-Policy (only its own origin)
// plus what a <meta> tag cannot say: frame-ancestors 'none', so no other site can frame the app and trick
// clicks on it; X-Frame-Options DENY says the same to older browsers.

/** The page's Content-Security-Policy, as in index.html's <meta> tag (tests/scripts/securityHeaders.test.ts keeps them equal). */
export const PAGE_CSP = "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' blob: data:; font-src 'self'; connect-src 'self' blob: data:; worker-src 'self' blob:; object-src 'none'; base-uri 'self'; form-action 'none'";

/** Every header the server sends with each response. */
export const SECURITY_HEADERS: Record<string, string> = {
  'Content-Security-Policy': `${PAGE_CSP}; frame-ancestors 'none'`,
  'X-Frame-Options': 'DENY',
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
};
