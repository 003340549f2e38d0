import type { Metadata } from "next";
import "./globals.css";
import { serif, sans, mono } from "./fonts";
import { Providers } from "@/components/providers";
import { Footer } from "@/components/shell/footer";

export const metadata: Metadata = {
  title: { default: "Echoline", template: "%s · Echoline" },
  description: "How research methods are used across a discipline: cut-offs, their sources, and how they spread.",
};

// Applied before paint so the dark theme does not flash. It also turns off zod's compiled parsers in
// the browser before any bundle loads: zod probes for them with Function(""), which the
// Content-Security-Policy (no 'unsafe-eval', next.config.mjs) refuses and reports as a violation.
// zod reads this global as its shared configuration (zod/v4/core, globalConfig).
const themeScript = `globalThis.__zod_globalConfig=Object.assign(globalThis.__zod_globalConfig||{},{jitless:true});try{var t=localStorage.getItem('echoline-theme');if(t==='dark'||(!t&&matchMedia('(prefers-color-scheme: dark)').matches))document.documentElement.classList.add('dark')}catch(e){}`;

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${serif.variable} ${sans.variable} ${mono.variable}`} suppressHydrationWarning>
      <head>
        <script dangerouslySetInnerHTML={{ __html: themeScript }} />
      </head>
      <body className="min-h-screen flex flex-col bg-paper text-ink antialiased">
        <a href="#main" className="skip-link">
          Skip to content
        </a>
        <Providers>
          <div className="flex-1 flex flex-col">{children}</div>
        </Providers>
        <Footer />
      </body>
    </html>
  );
}
