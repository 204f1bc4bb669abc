// @ts-nocheck
import "@fontsource-variable/inter";
import "./globals.css";
import type { Metadata } from "next";
import { cookies } from "next/headers";

export const metadata: Metadata = {
  title: { default: "Pulleywright", template: "%s · Pulleywright" },
  description: "Boost, blower speed and pulley choice for positive-displacement superchargers.",
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  const theme = (await cookies()).get("pw-theme")?.value;
  const themeClass = theme === "dark" ? "theme-dark" : theme === "light" ? "theme-light" : "";
  return (
    <html lang="en" className={themeClass}>
      <body className="min-h-screen antialiased">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-panel focus:px-3 focus:py-2">
          Skip to content
        </a>
        {children}
      </body>
    </html>
  );
}
