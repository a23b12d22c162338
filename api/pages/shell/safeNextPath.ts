/**
 * Where to go after signing in: only a path inside the pages, so the sign-in form cannot be
 * used to bounce a user to another site.
 *
 * @example
 * safeNextPath('/lab/models/42'); // '/lab/models/42'
 * safeNextPath('//evil.example'); // '/lab'
 */
export function safeNextPath(candidate: string | undefined): string {
  if (!candidate || !/^\/lab(\/|\?|$)/.test(candidate) || candidate.includes('\\') || candidate.startsWith('//')) return '/lab';
  return candidate.startsWith('/lab/sign-') ? '/lab' : candidate;
}
