/** Whether an If-Match field value ("*" or a list of entity tags) names the tag. */
export function ifMatchAccepts(ifMatch: string, etag: string): boolean {
  return ifMatch.split(',').some((candidate) => {
    const tag = candidate.trim();
    return tag === '*' || tag === etag;
  });
}
