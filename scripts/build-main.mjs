// Bundles the Electron main process (ESM) and its preload script (CommonJS, as sandboxed
// preloads require) into dist/electron/. 'electron' and Node built-ins stay external.
import { build } from 'vite';
import { builtinModules } from 'node:module';

const external = ['electron', /^node:/, ...builtinModules];

async function bundle(entry, format, fileName) {
  await build({
    configFile: false,
    logLevel: 'warn',
    build: {
      outDir: 'dist/electron',
      emptyOutDir: false,
      target: 'node22',
      minify: false,
      sourcemap: false,
      ssr: true,
      lib: { entry, formats: [format], fileName: () => fileName },
      rolldownOptions: { external, output: { entryFileNames: fileName } },
    },
  });
}

await bundle('main/entry.ts', 'es', 'main.mjs');
await bundle('main/preload.ts', 'cjs', 'preload.cjs');
console.log('main process bundled to dist/electron/main.mjs and dist/electron/preload.cjs');
