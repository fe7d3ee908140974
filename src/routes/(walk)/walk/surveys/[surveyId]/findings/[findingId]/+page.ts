// A client-rendered page of the Walk shell: never prerendered (its survey comes from the
// device database), served offline by the service worker as the precached Walk shell.
export const prerender = false;
