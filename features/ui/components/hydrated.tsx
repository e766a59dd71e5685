import { useEffect, useState, type ReactNode } from 'react';

/** Renders children only after mount, for browser-only hosts such as the Skia canvas. */
export function ClientOnly({ children, fallback = null }: { children: ReactNode; fallback?: ReactNode }) {
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  return <>{mounted ? children : fallback}</>;
}
