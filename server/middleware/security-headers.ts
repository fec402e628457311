import helmet from 'helmet';

// Everything from our own origin, nothing inline, no eval. frame-ancestors stays 'none' until
// the embed issue opens it per embed and per supplier origin.
export const contentSecurityPolicy = {
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'"],
  'img-src': ["'self'", 'data:'],
  'font-src': ["'self'"],
  'connect-src': ["'self'"],
  'object-src': ["'none'"],
  'base-uri': ["'self'"],
  'form-action': ["'self'"],
  'frame-ancestors': ["'none'"],
} as const;

export function securityHeaders() {
  return helmet({
    // useDefaults off: helmet's defaults would add upgrade-insecure-requests, which breaks
    // plain-http installs on a LAN address.
    contentSecurityPolicy: { useDefaults: false, directives: contentSecurityPolicy },
    // The legacy header must agree with frame-ancestors 'none' for browsers that only read it.
    xFrameOptions: { action: 'deny' },
  });
}
