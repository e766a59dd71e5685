/** A full-page navigation: sign-in leaves the app for the provider and comes back. */
export function goTo(href: string): void {
  if (typeof window !== 'undefined') window.location.assign(href);
}

export function currentPath(): string {
  return typeof window !== 'undefined' ? `${window.location.pathname}${window.location.search}` : '/';
}
