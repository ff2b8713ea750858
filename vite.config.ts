import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig, type Plugin } from 'vite';
import { compression } from 'vite-plugin-compression2';

/** Preloads the Karla files the first screen uses, so text never flashes in a fallback face. */
function preloadFonts(): Plugin {
  return {
    name: 'larderly-preload-fonts',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const fonts = Object.keys(ctx.bundle ?? {}).filter((file) =>
          /karla-latin-(400|700)-normal.*\.woff2$/.test(file),
        );
        return fonts.map((file) => ({
          tag: 'link',
          attrs: { rel: 'preload', href: `/${file}`, as: 'font', type: 'font/woff2', crossorigin: '' },
          injectTo: 'head',
        }));
      },
    },
  };
}

const ENTRY_HTML = fileURLToPath(new URL('./index.html', import.meta.url));
/**
 * Where the page's first code comes from, before any screen's: the offline restore (loaded before every first render)
 * and what the sign-in page needs besides its own route module.
 */
const SHELL_STARTS = ['./src/app/restore-offline.ts', './src/app/routes/sign-in.tsx'].map((file) =>
  fileURLToPath(new URL(file, import.meta.url)),
);

/**
 * The modules each page loads before its screen, found from the module graph once it is built: `entry`, what
 * index.html imports statically (it stays in the entry chunk); `shell`, what the offline restore and the sign-in
 * page import statically besides that. Only the signed-in screens' shared code is left for the common chunk, so
 * sign-in loads none of it. A module the shell imports through an entry file (src/features/<name>/index.ts,
 * shared/words/index.ts) drags every module that entry names into the shell: the shell imports narrow modules.
 */
const firstCode = {
  entry: new Set<string>(),
  shell: new Set<string>(),
  auth: new Set<string>(),
  /** What the signed-in layouts import statically besides the first code. */
  layouts: new Set<string>(),
  /** How many of the build's entries (index.html and every lazily imported module) reach each module statically. */
  shared: new Map<string, number>(),
};
function findFirstCode(): Plugin {
  return {
    name: 'larderly-first-code',
    apply: 'build',
    buildEnd() {
      const reach = (starts: string[], into: Set<string>, skip: Set<string>) => {
        const queue = [...starts];
        while (queue.length) {
          const id = queue.pop()!;
          if (into.has(id) || skip.has(id)) continue;
          into.add(id);
          queue.push(...(this.getModuleInfo(id)?.importedIds ?? []));
        }
      };
      firstCode.entry.clear();
      firstCode.shell.clear();
      firstCode.auth.clear();
      firstCode.shared.clear();
      firstCode.layouts.clear();
      const entries = new Set([ENTRY_HTML]);
      for (const id of this.getModuleIds())
        for (const lazy of this.getModuleInfo(id)?.dynamicallyImportedIds ?? []) entries.add(lazy);
      for (const start of entries) {
        const reached = new Set<string>();
        reach([start], reached, new Set());
        for (const id of reached) firstCode.shared.set(id, (firstCode.shared.get(id) ?? 0) + 1);
      }
      reach([ENTRY_HTML], firstCode.entry, new Set());
      reach(SHELL_STARTS, firstCode.shell, firstCode.entry);
      // The sign-in screen's own module stays its chunk, and the code only the auth screens use (their form, layout and
      // calls) the auth chunk; the offline restore is loaded by every page, so it joins.
      firstCode.shell.delete(SHELL_STARTS[1]!);
      for (const id of firstCode.shell) if (authScreensOnly(id)) firstCode.auth.add(id);
      for (const id of firstCode.auth) firstCode.shell.delete(id);
      const layouts = [...this.getModuleIds()].filter(signedInLayout);
      reach(layouts, firstCode.layouts, new Set([...firstCode.entry, ...firstCode.shell]));
    },
  };
}

/** The sign-in, sign-up and invitation screens' own layout, forms and calls, which no signed-in screen loads. */
const authScreensOnly = (id: string) =>
  /[\\/]src[\\/](app[\\/]layouts[\\/]auth-layout\.tsx|features[\\/]auth[\\/](components[\\/]|api[\\/](login|signup)))/.test(
    id,
  );

/** The layouts every household screen renders inside: a screen loads them with its shared code, in one file. */
const signedInLayout = (id: string) => /[\\/]src[\\/]app[\\/]layouts[\\/](require-auth|app-layout)\.tsx$/.test(id);

/**
 * The app's code outside its screens that two or more signed-in screens share, and their layouts (the first code
 * aside). date-fns's few functions join it rather than making a file of their own.
 */
function signedInShared(id: string) {
  if (firstCode.entry.has(id) || firstCode.shell.has(id)) return false;
  if (firstCode.layouts.has(id)) return true;
  const shared = (firstCode.shared.get(id) ?? 0) >= 2;
  if (/node_modules[\\/]date-fns[\\/]/.test(id)) return shared;
  return (
    shared &&
    !id.includes('node_modules') &&
    /[\\/](src|shared)[\\/]/.test(id) &&
    !/[\\/]src[\\/]app[\\/](routes|layouts)[\\/]/.test(id)
  );
}

export default defineConfig({
  // Brotli and gzip copies of every file over 1 KB beside it, which the server sends to browsers that accept them.
  plugins: [
    react(),
    tailwindcss(),
    preloadFonts(),
    findFirstCode(),
    compression({
      algorithms: ['brotliCompress', 'gzip'],
      threshold: 1024,
      exclude: [/\.(br|gz|woff2?|png|jpe?g|webp)$/],
    }),
  ],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
    },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    manifest: true,
    sourcemap: false,
    // The service worker is a second entry, written to /sw.js so its scope is the whole app.
    rolldownOptions: {
      input: {
        main: ENTRY_HTML,
        sw: fileURLToPath(new URL('./src/sw.ts', import.meta.url)),
      },
      output: {
        entryFileNames: (chunk) => (chunk.name === 'sw' ? 'sw.js' : 'assets/[name]-[hash].js'),
        // The first code every page loads besides the entry (see firstCode) in one chunk, with Rolldown's runtime
        // helpers: the offline restore, the words and components sign-in shows, and what they import.
        // The app's own modules that several signed-in screens share (components, lib, words, feature APIs) in one
        // chunk: a screen then loads three or four files, not twenty small ones that a phone fetches a few at a time.
        codeSplitting: {
          groups: [
            {
              name: 'main',
              test: (id) =>
                firstCode.shell.has(id) ||
                (firstCode.entry.has(id) && id !== ENTRY_HTML) ||
                /node_modules[\\/]@tanstack[\\/](query-|react-query)/.test(id) ||
                id.includes('rolldown/runtime'),
              priority: 2,
              includeDependenciesRecursively: false,
            },
            { name: 'common', test: signedInShared, priority: 1, includeDependenciesRecursively: false },
            { name: 'auth', test: (id) => firstCode.auth.has(id), priority: 1, includeDependenciesRecursively: false },
          ],
        },
      },
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${process.env.API_PORT ?? 3001}` },
  },
});
