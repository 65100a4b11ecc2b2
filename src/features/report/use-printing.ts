/** Native builds do not print from the app: never printing. */
export function usePrinting(): boolean {
  return false;
}
