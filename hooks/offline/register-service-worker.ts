/** Native apps start from their installed bundle; only the web needs a service worker. */
export function registerServiceWorker() {}
