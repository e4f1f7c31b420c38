// Builds the `voltcast` command to plain JavaScript: the CLI and the core it uses, bundled by
// esbuild into dist/main.js and the envelope worker into dist/worker.js, so that the command
// starts with no TypeScript loader. piscina stays outside: it starts its own threads from its
// own files. CommonJS packages inside the bundle get a `require` of their own.
import { build } from 'esbuild';

await build({
  absWorkingDir: new URL('.', import.meta.url).pathname,
  entryPoints: { main: 'src/main.ts', worker: 'src/envelope/worker.ts' },
  outdir: 'dist',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  external: ['piscina'],
  sourcemap: 'linked',
  logLevel: 'warning',
  banner: { js: "import { createRequire as __voltcastRequire } from 'node:module'; const require = __voltcastRequire(import.meta.url);" },
});
