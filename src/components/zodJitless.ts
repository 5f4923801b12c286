// Zod 4 compiles object parsers with `new Function` when the page allows it, and probes for that the first time a
// schema is built. Our Content-Security-Policy allows no eval, so the browser refuses the probe and reports a
// policy violation on every page with an island, although zod then falls back to its plain parser. Jitless mode
// skips the probe. This must run before any schema is built in the browser: astro.config.mjs injects it before
// every island hydrates, and page scripts that build schemas import it first.
// It also installs the plain validation messages (shared/forms/plainMessages.ts) for every form in the browser.
import { z } from 'zod';
import { installPlainMessages } from '@shared/forms/plainMessages.ts';

z.config({ jitless: true });
installPlainMessages();
