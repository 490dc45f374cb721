import { createSerwistRoute } from "@serwist/turbopack";

// The service worker at /serwist/sw.js, bundled at build time from app/sw.ts with the list of the build's files to
// keep: its scripts and styles, the Latin faces of the two fonts (the text faces the pages use), and public/, where
// the offline page is.
const distDir = (process.env.NEXT_DIST_DIR || ".next").replace(/^\/|\/$/g, "");

export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "app/sw.ts",
  useNativeEsbuild: true,
  globPatterns: [`${distDir}/static/**/*.{js,css,svg,json}`, `${distDir}/static/media/*-latin-*.woff2`, "public/**/*"],
});
