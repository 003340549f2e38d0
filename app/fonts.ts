import localFont from "next/font/local";

// Shipped in fonts/ (open licences, copied from @fontsource packages); nothing is fetched.
export const serif = localFont({
  src: [
    { path: "../fonts/source-serif-4-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/source-serif-4-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../fonts/source-serif-4-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../fonts/source-serif-4-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-serif",
  display: "swap",
});
export const sans = localFont({
  src: [
    { path: "../fonts/inter-latin-400-normal.woff2", weight: "400" },
    { path: "../fonts/inter-latin-500-normal.woff2", weight: "500" },
    { path: "../fonts/inter-latin-600-normal.woff2", weight: "600" },
    { path: "../fonts/inter-latin-700-normal.woff2", weight: "700" },
  ],
  variable: "--font-sans",
  display: "swap",
});
export const mono = localFont({
  src: [{ path: "../fonts/jetbrains-mono-latin-400-normal.woff2", weight: "400" }],
  variable: "--font-mono",
  display: "swap",
});
