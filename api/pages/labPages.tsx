import { Hono } from 'hono';
import type { AppEnv } from '../AppEnv.ts';
import { annealingPageRoutes } from './annealing/annealingPageRoutes.tsx';
import { modelPageRoutes } from './model/modelPageRoutes.tsx';
import { overviewRoutes } from './overview/overviewRoutes.tsx';
import { readingEntryRoutes } from './reading/readingEntryRoutes.tsx';
import { LAB_STYLESHEET } from './shell/labStylesheet.ts';
import { pageSecurity } from './shell/pageSecurity.ts';
import { pageSession } from './shell/pageSession.ts';
import { signInRoutes } from './shell/signInRoutes.tsx';
import { trendPageRoutes } from './trends/trendPageRoutes.tsx';

/**
 * The server-rendered lab pages, mounted at /lab beside the API and kept out of its OpenAPI
 * document. Sign-in and the stylesheet are public; everything else needs the key cookie.
 */
export function labPages(): Hono<AppEnv> {
  const pages = new Hono<AppEnv>();
  pages.use('*', pageSecurity());
  pages.get('/assets/lab.css', (c) => c.body(LAB_STYLESHEET, 200, { 'content-type': 'text/css; charset=utf-8' }));
  signInRoutes(pages);
  pages.use('*', pageSession());
  overviewRoutes(pages);
  modelPageRoutes(pages);
  readingEntryRoutes(pages);
  trendPageRoutes(pages);
  annealingPageRoutes(pages);
  return pages;
}
