/** Leaving or reloading the page, in one object so tests can stand in for the browser. */
export const browser = {
  /** Goes to another site (the payment provider's checkout). */
  assign: (url: string) => window.location.assign(url),
  reload: () => window.location.reload(),
};
