import localFont from "next/font/local";

// Fonts ship with the app from npm font packages; nothing is fetched at build or run time.
export const sans = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  variable: "--font-body",
  display: "swap",
  weight: "100 900",
});

export const mono = localFont({
  src: "../node_modules/@fontsource-variable/source-code-pro/files/source-code-pro-latin-wght-normal.woff2",
  variable: "--font-numeric",
  display: "swap",
  weight: "200 900",
});
