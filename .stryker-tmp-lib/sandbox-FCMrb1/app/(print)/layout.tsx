// @ts-nocheck
import "./print.css";

// Print views: no navigation, no theme; the sheet alone, black on white.
export default function PrintLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="print-root">
      <main id="main">{children}</main>
    </div>
  );
}
