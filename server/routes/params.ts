/** A positive whole-number route parameter, or NaN (which every lookup answers with 404). */
export function idParam(value: string | undefined): number {
  return value && /^\d{1,15}$/.test(value) ? Number(value) : NaN;
}
