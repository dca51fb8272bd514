// Inter ships inside the app from the @fontsource-variable/inter npm package: nothing is fetched at
// build or run time.
import localFont from "next/font/local";

/** Upright Inter, every weight in one variable file, preloaded: every page's text is set in it. */
export const inter = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  weight: "100 900",
  variable: "--font-inter",
  display: "swap",
});

/** Inter's italic, for the few quoted lines (`font-quote italic`). Not preloaded: the browser fetches
 * it only on a page that shows italic text, so the rider's pages do not download 50 KiB they never
 * paint (a preload competes with the page's own scripts on a phone's connection). */
export const interItalic = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-italic.woff2",
  weight: "100 900",
  style: "italic",
  variable: "--font-inter-italic",
  display: "swap",
  preload: false,
});
