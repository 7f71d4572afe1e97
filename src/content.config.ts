/**
 * The site keeps no content collections: the pages read the catalogue once per build, by
 * reference, through components/content-entries.ts (from src/site: our own records, schema and
 * derivations, through the derivation cache). A collection would copy every entry into Astro's
 * data store and deep-copy it again on every read — quadratic in the catalogue, since species
 * and mechanism pages each read whole lists — and its loader would load the catalogue a second
 * time in a module instance of its own.
 */
export const collections = {};
