import { z } from 'zod';

// zod 4 probes `new Function` once unless told not to; the web app's CSP forbids eval.
z.config({ jitless: true });

export { z };
