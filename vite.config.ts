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

/** The app's code outside its screens and layouts, which the shared chunk may hold. */
function sharedAppModule(id: string) {
  return (
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
        main: fileURLToPath(new URL('./index.html', import.meta.url)),
        sw: fileURLToPath(new URL('./src/sw.ts', import.meta.url)),
      },
      output: {
        entryFileNames: (chunk) => (chunk.name === 'sw' ? 'sw.js' : 'assets/[name]-[hash].js'),
        // TanStack Query in one chunk: the offline restore (a chunk of its own) shares its classes with the first
        // screen, which otherwise splits them into several small files that compress worse.
        // The app's own modules that several screens share (components, lib, words, feature APIs) in one chunk: a
        // screen then loads three or four files, not twenty small ones that a phone fetches a few at a time.
        codeSplitting: {
          groups: [
            { name: 'query', test: /node_modules[\\/]@tanstack[\\/](query-core|react-query)[\\/]/ },
            { name: 'common', test: sharedAppModule, minShareCount: 2, includeDependenciesRecursively: false },
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
