import type { ReactNode } from 'react';
import { ThemeToggle } from '../ui/theme-toggle';

/** A single card on the paper ground, for pages seen before signing in. */
export function CenteredLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <div className="flex justify-end px-6 pt-4">
        <ThemeToggle />
      </div>
      <main id="main" className="flex flex-1 items-start justify-center px-6 pb-16 pt-[10vh]">
        <div className="w-full max-w-md rounded-xl border border-rule-faint bg-paper-raised px-8 py-9 shadow-[0_1px_0_var(--if-rule-faint),0_12px_32px_-20px_rgb(0_0_0/0.35)]">
          {children}
        </div>
      </main>
    </div>
  );
}
