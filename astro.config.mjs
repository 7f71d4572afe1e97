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
  telemetry: false,
});
