/** The API refuses larger files; checking first saves the upload. */
export const maxPriceListBytes = 5 * 1024 * 1024;

const accepted = ['.xlsx', '.csv'];

/** Null when the file may be sent, else the reason it is refused. */
export function checkPriceListFile(file: File): string | null {
  const name = file.name.toLowerCase();
  if (!accepted.some((ext) => name.endsWith(ext))) {
    return `"${file.name}" is not a price list Linesmith can read: choose an .xlsx workbook or a .csv file.`;
  }
  if (file.size === 0) return `"${file.name}" is empty.`;
  if (file.size > maxPriceListBytes) {
    return `"${file.name}" is ${(file.size / 1024 / 1024).toFixed(1)} MB; price lists can be at most 5 MB. Split it, or remove columns Linesmith does not need.`;
  }
  return null;
}
