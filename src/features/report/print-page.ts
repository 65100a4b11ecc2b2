/** Printing is a browser feature; native builds offer it nowhere. */
export const canPrint = false;

export function printPage(): void {}
