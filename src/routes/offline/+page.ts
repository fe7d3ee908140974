// Prerendered and precached: shown by the service worker when a page is not available offline.
export const prerender = true;
