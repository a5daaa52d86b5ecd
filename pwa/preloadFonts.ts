import type { HtmlTagDescriptor, Plugin } from 'vite';

/**
 * The bundled Atkinson Hyperlegible files the first screen draws with (Latin, regular and bold).
 * The other subsets stay on demand through their unicode-range.
 */
const FIRST_SCREEN_FONT = /\/atkinson-hyperlegible-latin-(400|700)-normal-[^/]*\.woff2$/;

/**
 * Adds a preload link for each first-screen font file of the build to index.html, so the browser
 * fetches the fonts with the entry script instead of after the first render has asked for them
 * (the @font-face rules keep font-display: swap, so text never waits for them).
 */
export function preloadFonts(): Plugin {
  return {
    name: 'siteband-preload-fonts',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(_html, { bundle }) {
        const files = Object.keys(bundle ?? {}).filter((file) => FIRST_SCREEN_FONT.test(`/${file}`));
        if (files.length === 0) throw new Error('preloadFonts: no Atkinson Hyperlegible Latin woff2 file in the build');
        return files.map(
          (file): HtmlTagDescriptor => ({
            tag: 'link',
            attrs: { rel: 'preload', as: 'font', type: 'font/woff2', href: `/${file}`, crossorigin: '' },
            injectTo: 'head',
          }),
        );
      },
    },
  };
}
