import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/** One chunk of the build manifest (dist/client/.vite/manifest.json), as Vite writes it. */
interface ManifestChunk {
  file: string;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

/**
 * The modules a screen's first render needs besides the entry: the offline restore, the layouts, the screen. The build
 * (vite.config.ts) may keep a module inside a shared chunk, with no manifest key of its own (the offline restore in the
 * entry's, the layouts in the signed-in screens' common chunk): the screen's chunk imports that chunk, so it is linked.
 */
const RESTORE = 'src/app/restore-offline.ts';
const SIGNED_IN = ['src/app/layouts/require-auth.tsx', 'src/app/layouts/app-layout.tsx'];
const route = (name: string) => `src/app/routes/${name}.tsx`;

/** A household's id in an address: only such a value is written into the page. */
const ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

interface Hints {
  modules: string[];
  /**
   * API reads the screen makes first, fetched in parallel with its code instead of after it. Only reads the screen
   * always makes on its first render: a preload nobody takes at once could answer a later read with an older copy.
   */
  reads: string[];
}

/** What the screen at this address loads first (see src/app/router.tsx), or null for an address with no hints. */
function hintsFor(pathname: string): Hints | null {
  const parts = pathname.split('/').filter(Boolean);
  // The address a bookmark or the home-screen icon opens: it reads the session, then goes to the household.
  if (parts.length === 0)
    return { modules: ['src/app/layouts/require-auth.tsx', route('home-redirect')], reads: ['/api/auth/me'] };
  if (parts[0] === 'sign-in' && parts.length === 1) return { modules: [route('sign-in')], reads: ['/api/auth/me'] };
  if (parts[0] === 'sign-up' && parts.length === 1) return { modules: [route('sign-up')], reads: [] };
  if (parts[0] === 'j' && parts.length === 2)
    return { modules: ['src/app/layouts/require-auth.tsx', route('jar')], reads: ['/api/auth/me'] };
  if (parts[0] !== 'h' || !parts[1] || !ID.test(parts[1]) || parts.length > 3) return null;
  const household = `/api/households/${parts[1]}`;
  const screen = parts[2] ?? 'today';
  const reads: Record<string, string[]> = {
    today: [`${household}/today`, `${household}/products`],
    // The gifts and places too: the header's line says this year's gifts and the place filter sits above the jars,
    // and the shelf waits for both rather than move when they come.
    shelf: [`${household}/jars`, `${household}/products`, `${household}/gifts`, `${household}/places`],
    week: [`${household}/meals`],
  };
  // The household itself too: the week's first day and the setup banner wait for it.
  return { modules: [...SIGNED_IN, route(screen)], reads: ['/api/auth/me', household, ...(reads[screen] ?? [])] };
}

/**
 * index.html for each address, with the screen's own chunks as modulepreload links and its first API reads as
 * fetch preloads, so the browser asks for all of them while the entry script downloads, instead of one layer at
 * a time (entry, then the offline restore, then the layouts and the screen, then its data). Computed from the
 * build manifest once per kind of address; nothing is read from disk per request.
 */
export function firstScreenPages(root: string) {
  const html = readFileSync(path.join(root, 'index.html'), 'utf8');
  const manifestFile = path.join(root, '.vite', 'manifest.json');
  const manifest: Manifest = existsSync(manifestFile) ? JSON.parse(readFileSync(manifestFile, 'utf8')) : {};
  const inEntry = new Set<string>();
  for (const chunk of Object.values(manifest).filter((c) => html.includes(`/${c.file}"`))) closure(chunk, inEntry);

  /** The files a chunk needs, its static imports first (what index.html already links is left out). */
  function closure(chunk: ManifestChunk, into: Set<string>) {
    if (into.has(chunk.file)) return;
    into.add(chunk.file);
    for (const key of chunk.imports ?? []) if (manifest[key]) closure(manifest[key], into);
    for (const css of chunk.css ?? []) into.add(css);
  }

  const cache = new Map<string, string>();
  return (pathname: string): string => {
    const hints = hintsFor(pathname);
    if (!hints) return html;
    const cacheKey = hints.modules.join() + hints.reads.join();
    const cached = cache.get(cacheKey);
    if (cached) return cached;
    const files = new Set<string>();
    for (const key of [RESTORE, ...hints.modules]) if (manifest[key]) closure(manifest[key], files);
    const links = [
      ...[...files]
        .filter((file) => !inEntry.has(file))
        .map((file) =>
          file.endsWith('.css')
            ? `<link rel="stylesheet" crossorigin href="/${file}">`
            : `<link rel="modulepreload" crossorigin href="/${file}">`,
        ),
      // crossorigin (anonymous) is the mode and credentials of the app's own fetch (src/lib/api-client.ts), so the
      // preloaded answer is the one the screen reads.
      ...hints.reads.map((read) => `<link rel="preload" as="fetch" crossorigin href="${read}">`),
    ];
    const page = html.replace('</head>', `  ${links.join('\n    ')}\n  </head>`);
    // One entry per screen of each household seen: bounded by the households this process serves.
    if (cache.size < 10_000) cache.set(cacheKey, page);
    return page;
  };
}
