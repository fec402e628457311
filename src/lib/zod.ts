import { z } from 'zod';

// zod speeds up object parsing by compiling code with `new Function` unless told not
// to. Under the server's Content-Security-Policy (script-src 'self', no eval) even the
// probe for that is reported as a violation, so the client always parses without it.
// Client code imports zod from here, never from 'zod' directly.
z.config({ jitless: true });

export { z };
