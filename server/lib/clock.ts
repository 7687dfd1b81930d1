/** The server's clock. Expiry and overdue are always computed here, never from a phone's clock; tests may set it. */
export const clock = {
  now: (): Date => new Date(),
};
