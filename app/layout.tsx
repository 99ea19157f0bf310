import type { Metadata } from "next";
import localFont from "next/font/local";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { ToastProvider } from "@/components/ui/toast";
import "./globals.css";

const sans = localFont({
  src: [
    { path: "../public/fonts/source-sans-3-latin-wght-normal.woff2", weight: "200 900", style: "normal" },
    { path: "../public/fonts/source-sans-3-latin-wght-italic.woff2", weight: "200 900", style: "italic" },
  ],
  variable: "--font-sans",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Barwright", template: "%s · Barwright" },
  description: "Formulation, costing, batch sheets and labels for bean-to-bar chocolate makers.",
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request makes every page render per request, so each gets the
  // CSP nonce proxy.ts generated (Next.js applies it to its own scripts).
  await headers();
  return (
    <html lang="en" className={sans.variable}>
      <body>
        <ToastProvider>{children}</ToastProvider>
      </body>
    </html>
  );
}
