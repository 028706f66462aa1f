import 'server-only';
import { AppError } from '../../api/errors';
import { MAX_IMPORT_BYTES } from '../../species/csv-rows';

const CSV_TYPES = ['text/csv', 'text/plain', 'application/csv', 'application/vnd.ms-excel', 'application/octet-stream'];
const mb = (n: number) => `${(n / 1024 / 1024).toFixed(n % (1024 * 1024) === 0 ? 0 : 1)} MB`;

function tooLarge(): AppError {
  return new AppError('PAYLOAD_TOO_LARGE', `The file is larger than ${mb(MAX_IMPORT_BYTES)}, the most one import takes. Split it into smaller files.`);
}

/** The raw CSV bytes of an upload, refused early when too large, not text, or not UTF-8. */
export async function readCsvUpload(req: Request): Promise<{ bytes: Buffer; text: string }> {
  const type = (req.headers.get('content-type') ?? '').split(';')[0]!.trim().toLowerCase();
  if (type && !CSV_TYPES.includes(type)) {
    throw new AppError('UNSUPPORTED_MEDIA_TYPE', `Send the file as CSV (text/csv), not ${type}. Spreadsheets can be saved as “CSV UTF-8”.`);
  }
  if (Number(req.headers.get('content-length') ?? '0') > MAX_IMPORT_BYTES) throw tooLarge();
  const chunks: Uint8Array[] = [];
  let total = 0;
  if (req.body) {
    const reader = req.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > MAX_IMPORT_BYTES) {
        await reader.cancel();
        throw tooLarge();
      }
      chunks.push(value);
    }
  }
  const bytes = Buffer.concat(chunks);
  if (bytes.length === 0) throw new AppError('VALIDATION', 'The file is empty.', { fields: { file: 'The file is empty.' } });
  if (bytes.includes(0)) throw new AppError('UNSUPPORTED_MEDIA_TYPE', 'This is not a CSV file: it holds binary data. Save the sheet as “CSV UTF-8” and upload that.');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new AppError('VALIDATION', 'The file is not UTF-8 text. Save it as “CSV UTF-8” (Excel, LibreOffice and Numbers all offer it) and upload again.', {
      fields: { file: 'Not UTF-8.' },
    });
  }
  return { bytes, text: text.replace(/^\uFEFF/, '') };
}
