// Layer rules for voltcast (checked by test/architecture.test.ts and `pnpm layers`).
// Core folders follow the data's way through the program; each may import only the folders
// listed before it. The small-signal analyses sit beside `transient`, below `analysis`.
const layers = ['units', 'reading', 'waves', 'parts', 'circuit', 'solver', 'transient', 'small-signal', 'analysis'];
const core = 'packages/core/src/';

const upward = layers.slice(0, -1).map((layer, i) => ({
  name: `${layer}-imports-upward`,
  comment: `${layer} may import only ${layers.slice(0, i).join(', ') || 'nothing of core'}; move the shared piece down instead`,
  severity: 'error',
  from: { path: `^${core}${layer}/` },
  to: { path: `^${core}(${layers.slice(i + 1).join('|')})/` },
}));

module.exports = {
  forbidden: [
    ...upward,
    {
      name: 'no-cycles',
      comment: 'a cycle ties modules together so neither can be read or tested alone',
      severity: 'error',
      from: {},
      to: { circular: true },
    },
    {
      name: 'core-not-through-public-index',
      comment: 'a layer imports the modules it needs, never the public index.ts',
      severity: 'error',
      from: { path: `^${core}` },
      to: { path: `^${core}index\\.ts$` },
    },
    {
      name: 'core-without-node',
      comment: 'the core runs in a browser or a worker: no file system, no process',
      severity: 'error',
      from: { path: `^${core}` },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'cli-through-public-api',
      comment: 'the CLI uses the core as an embedder does, through @voltcast/core',
      severity: 'error',
      from: { path: '^packages/cli/src/' },
      to: { path: `^${core}`, pathNot: `^${core}index\\.ts$` },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: { extensions: ['.ts', '.js', '.mjs'] },
  },
};
