import ExcelJS from 'exceljs';
import type { Response } from 'superagent';
import type { TestApp } from './test-app.js';

type Callback = (error: Error | null, body: Buffer) => void;

function binary(response: Response & NodeJS.ReadableStream, callback: Callback): void {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => callback(null, Buffer.concat(chunks)));
}

/** Downloads a spreadsheet through the API and opens it with exceljs. */
export async function downloadWorkbook(testApp: TestApp, url: string, token: string): Promise<{ workbook: ExcelJS.Workbook; headers: Record<string, string> }> {
  const response = await testApp
    .http()
    .get(url)
    .set({ Authorization: `Bearer ${token}` })
    .buffer(true)
    .parse(binary as never)
    .expect(200);
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(response.body as never);
  return { workbook, headers: response.headers as Record<string, string> };
}

/** The first row whose cells include `text` (1-based), or 0. */
export function rowWith(sheet: ExcelJS.Worksheet, text: string): number {
  let found = 0;
  sheet.eachRow((row, number) => {
    if (!found && (row.values as unknown[]).includes(text)) found = number;
  });
  return found;
}
