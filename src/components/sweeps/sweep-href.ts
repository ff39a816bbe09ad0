/** The page showing a chosen sweep: the page's own address (which may carry a query) with `sweep=<id>`. */
export const sweepHref = (pagePath: string, sweepId: string) => `${pagePath}${pagePath.includes("?") ? "&" : "?"}sweep=${sweepId}`;
