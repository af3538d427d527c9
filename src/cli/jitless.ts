import { z } from 'zod';

// A one-shot process validates each schema a few times: zod's compiled fast path costs more
// to build than it saves here, so it is turned off (same results, measured in bench/startup.mjs).
// zod reads the setting when a schema is built, not when it parses: this module is evaluated
// before any module that builds a schema (main.ts and the snapshot entry import it first).
z.config({ jitless: true });
