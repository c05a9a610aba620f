/**
 * Which of a set of section links is the current one for `pathname`: the link to the page itself,
 * else the longest link the path sits below (a commission's page marks "Commissions"; its Spec tab
 * marks "Spec", not "Overview"). Null when the path is under none of them.
 */
export function currentLink(pathname: string, hrefs: readonly string[]): string | null {
  let best: string | null = null;
  for (const href of hrefs) {
    const under = pathname === href || pathname.startsWith(href.endsWith("/") ? href : `${href}/`);
    if (under && (best === null || href.length > best.length)) best = href;
  }
  return best;
}
