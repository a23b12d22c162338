import type { Child } from 'hono/jsx';

export interface LayoutProps {
  title: string;
  /** Signed-in pages show the navigation and the sign-out button. */
  signedIn?: boolean;
  /** Pages meant for paper (annealing plans) add the print class. */
  printable?: boolean;
  children?: Child;
}

/** The page shell: one stylesheet, no script, a skip link for keyboard users. */
export function Layout({ title, signedIn = true, printable = false, children }: LayoutProps) {
  return (
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>{`${title} · fringe-ledger`}</title>
        <link rel="stylesheet" href="/lab/assets/lab.css" />
      </head>
      <body class={printable ? 'printable' : undefined}>
        <a class="skip" href="#main">Skip to content</a>
        <header class="masthead">
          <a class="brand" href="/lab">fringe-ledger</a>
          {signedIn && (
            <nav aria-label="Lab pages">
              <a href="/lab">Overview</a>
              <a href="/lab/trends">Trends</a>
              <form method="post" action="/lab/sign-out" class="inline">
                <button type="submit" class="link-button">Sign out</button>
              </form>
            </nav>
          )}
        </header>
        <main id="main">{children}</main>
      </body>
    </html>
  );
}
