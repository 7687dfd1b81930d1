/** Native builds have no print layout; the web app prints the board. */
export function BoardPrintStyles() {
  return null;
}

export const printBoard = () => {};
export const canPrint = false;
