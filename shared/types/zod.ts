import { z } from 'zod';

// The web app runs under a Content-Security-Policy without 'unsafe-eval'. Zod probes for eval
// (new Function) when it builds object schemas, which the browser reports as a CSP violation.
// Every schema in Tunefork is built through this module so the probe is switched off first.
z.config({ jitless: true });

export { z };
