// The Walk is an app shell rendered on the device: prerendered once, precached by the
// service worker, so it opens in a plant room with no signal. Data comes from the device
// database and the sync API, never from server-rendered HTML.
export const prerender = true;
export const ssr = false;
