import helmet from 'helmet';

/**
 * Security headers on every answer (API, API docs and the built web app). The content security policy allows
 * only our own scripts; styles may be inline because antd writes its CSS-in-JS into <style> tags at run time;
 * images and fonts may also come from data: and blob: URLs (drawings exported as images, embedded font data).
 */
export function createSecurityHeadersMiddleware() {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
      },
    },
    // Same-origin app: no cross-origin embedding needed.
    crossOriginEmbedderPolicy: false,
  });
}
