import helmet from 'helmet';

/**
 * Helmet's headers with a Content-Security-Policy for the built client served from this origin:
 * scripts and fonts (@fontsource, self-hosted) only from here; inline styles allowed because
 * Mantine writes its styles into <style> tags at run time; nothing may frame the app.
 * `upgrade-insecure-requests` is left out: on a plain-HTTP ward network it would send every
 * asset request to an https port that does not exist.
 */
export function securityHeaders() {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        'script-src-attr': ["'none'"],
        'style-src': ["'self'", "'unsafe-inline'"],
        'font-src': ["'self'", 'data:'],
        'img-src': ["'self'", 'data:', 'blob:'],
        'connect-src': ["'self'"],
        'object-src': ["'none'"],
        'base-uri': ["'self'"],
        'form-action': ["'self'"],
        'frame-ancestors': ["'none'"],
      },
    },
    frameguard: { action: 'deny' },
  });
}
