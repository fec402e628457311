import type { BrowserContext, Page } from 'playwright-core';

export interface PageProblems {
  consoleErrors: string[];
  pageErrors: string[];
  cspViolations: string[];
  failedRequests: string[];
  all: () => string[];
  clear: () => void;
}

/**
 * Record everything on a page that a user would never see but that means it is broken:
 * console errors, uncaught exceptions, Content-Security-Policy violations and failed
 * requests. CSP violations are caught by the page's own `securitypolicyviolation`
 * event, reported through a binding, so they count even when Chromium logs them quietly.
 */
export async function watchContext(context: BrowserContext): Promise<PageProblems> {
  const problems: PageProblems = {
    consoleErrors: [],
    pageErrors: [],
    cspViolations: [],
    failedRequests: [],
    all: () => [
      ...problems.consoleErrors.map((m) => `console: ${m}`),
      ...problems.pageErrors.map((m) => `exception: ${m}`),
      ...problems.cspViolations.map((m) => `csp: ${m}`),
      ...problems.failedRequests.map((m) => `request: ${m}`),
    ],
    clear: () => {
      problems.consoleErrors.length = 0;
      problems.pageErrors.length = 0;
      problems.cspViolations.length = 0;
      problems.failedRequests.length = 0;
    },
  };

  await context.exposeBinding('__pinworkReportViolation', (_source, text: string) => {
    problems.cspViolations.push(text);
  });
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      const report = (window as unknown as { __pinworkReportViolation: (t: string) => void })
        .__pinworkReportViolation;
      report(`${event.effectiveDirective} blocked ${event.blockedURI || "inline"} at ${event.sourceFile}:${event.lineNumber}:${event.columnNumber}`);
    });
  });

  const attach = (page: Page) => {
    page.on('console', (message) => {
      if (message.type() === 'error') problems.consoleErrors.push(message.text());
    });
    page.on('pageerror', (error) => problems.pageErrors.push(error.message));
    page.on('requestfailed', (request) => {
      const reason = request.failure()?.errorText ?? '';
      // A fetch the page itself cancels when the visitor moves on (TanStack Query aborts the
      // queries of the page left behind) is not a failure of the server or the app.
      if (reason === 'net::ERR_ABORTED' && request.resourceType() === 'fetch') return;
      problems.failedRequests.push(`${request.method()} ${request.url()}: ${reason}`);
    });
  };
  context.pages().forEach(attach);
  context.on('page', attach);
  return problems;
}
