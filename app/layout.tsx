import type { Metadata, Viewport } from "next";
import "@fontsource-variable/inter";
import "./globals.css";
import { ToastProvider } from "@/components/ui/toast";
import { OfflineSupport } from "@/components/offline/service-worker";

export const metadata: Metadata = {
  title: { default: "Spanwright", template: "%s · Spanwright" },
  description: "Plan, check and sign off slackline, longline and highline rigs with your crew.",
  icons: { icon: "/favicon.svg" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#11573d" };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body>
        <OfflineSupport>
          <ToastProvider>{children}</ToastProvider>
        </OfflineSupport>
      </body>
    </html>
  );
}
