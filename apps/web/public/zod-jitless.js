// Loaded as a classic script before the app's modules: zod then parses without compiling parsers
// through `new Function`, whose probe (though caught) the browser reports as a violation of the
// content-security policy, which allows no 'unsafe-eval'. zod reads this object when it loads.
globalThis.__zod_globalConfig = Object.assign(globalThis.__zod_globalConfig || {}, { jitless: true });
