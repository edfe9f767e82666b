// Preloaded by `npm run lint`: typescript-eslint needs the TypeScript 6 compiler API, and the
// project compiles with TypeScript 7, which has none yet (typescript-eslint issue #10940; the
// TypeScript 7.0 release notes advise running 6.0 beside it for such tools). Only this process
// sees TypeScript 6; `tsc` and `next build` keep TypeScript 7.
const Module = require("node:module");

const typescript6 = require.resolve("typescript", { paths: [__dirname] });
const resolve = Module._resolveFilename;
Module._resolveFilename = function (request, ...rest) {
  return resolve.call(this, request === "typescript" ? typescript6 : request, ...rest);
};
