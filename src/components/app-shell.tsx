import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { LogoMark } from './logo';
import { SafetyNote } from './safety-note';

export interface NavItem {
  to: string;
  label: string;
  soon?: boolean;
}

const navItems: NavItem[] = [
  { to: '/templates', label: 'Library' },
  { to: '/how-it-works', label: 'How it works' },
];

function navClass({ isActive }: { isActive: boolean }): string {
  const base = 'flex items-center gap-2 rounded-md px-3 py-2 text-sm font-semibold transition-colors';
  return isActive
    ? `${base} bg-ink-700 text-paper-50`
    : `${base} text-ink-100 hover:bg-ink-800 hover:text-paper-50`;
}

interface AppShellProps {
  children: ReactNode;
  /** Items the signed-in person's role may use, after the common ones. */
  roleNavItems?: NavItem[];
  /** The header's account corner (who is signed in, or the way in). */
  account?: ReactNode;
}

export function AppShell({ children, roleNavItems = [], account }: AppShellProps) {
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-signal-100 focus:px-4 focus:py-2 focus:font-semibold focus:text-ink-950"
      >
        Skip to content
      </a>
      <header className="bg-ink-900 text-paper-50 print:hidden">
        <div className="mx-auto flex max-w-page flex-wrap items-center justify-between gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
          <Link to="/" className="flex items-center gap-2.5 rounded-md py-1 text-lg font-extrabold tracking-tight">
            <LogoMark />
            <span>Pinwork</span>
          </Link>
          <nav aria-label="Main">
            <ul className="flex flex-wrap items-center gap-1">
              {[...navItems, ...roleNavItems].map((item) => (
                <li key={item.to}>
                  <NavLink to={item.to} className={navClass}>
                    {item.label}
                    {item.soon && (
                      <span className="rounded-full bg-signal-200 px-2 py-0.5 text-[0.7rem] font-bold text-signal-900">
                        coming soon
                      </span>
                    )}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          {account && <div className="flex items-center sm:ml-auto">{account}</div>}
        </div>
      </header>
      <main id="main" tabIndex={-1} className="flex-1 focus:outline-none">
        {children}
      </main>
      <footer className="border-t border-paper-300 bg-paper-200">
        <div className="mx-auto max-w-page px-4 py-6 text-xs leading-relaxed text-ink-800 sm:px-6">
          <SafetyNote compact />
          <p className="mt-2 font-semibold text-ink-700">
            Pinwork · statics templates for lifting, workholding and frames ·{' '}
            <Link to="/developers/api" className="underline decoration-ink-300 underline-offset-2 hover:text-ink-900">
              API reference
            </Link>
          </p>
        </div>
      </footer>
    </div>
  );
}
