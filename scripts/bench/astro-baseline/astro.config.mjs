// The minimal Astro site the benchmark compares `mechatlas build` with: one page per record.
import { defineConfig } from 'astro/config';

export default defineConfig({ output: 'static', telemetry: false, devToolbar: { enabled: false } });
