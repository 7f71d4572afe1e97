// The catalogue site: fully static, no external assets; records come through our own loader.
import { defineConfig } from 'astro/config';

export default defineConfig({
  output: 'static',
  outDir: process.env.MECHATLAS_OUT ?? 'dist',
  trailingSlash: 'always',
  build: { format: 'directory' },
  // Inline nothing from CDNs; KaTeX CSS and fonts are bundled by Vite from the katex package.
  vite: { build: { assetsInlineLimit: 0 } },
  devToolbar: { enabled: false },
  // Astro's anonymous usage reporting is not a config option: every script that runs Astro sets
  // ASTRO_TELEMETRY_DISABLED=1 before Astro loads (the build command, package.json scripts).
});
