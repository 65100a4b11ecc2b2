/** Native builds do not print: no print rules to add. */
export function PrintStyles() {
  return null;
}
