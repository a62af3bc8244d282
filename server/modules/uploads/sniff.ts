import { fileTypeFromBuffer } from 'file-type';

export type Sniffed =
  | { ok: true; contentType: string; extension: string }
  | { ok: false; reason: string };

const IMAGES: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png' };

/** A JPEG or PNG by its content (file-type reads the magic numbers), whatever the file is called. */
export async function sniffPhoto(data: Buffer): Promise<Sniffed> {
  const type = await fileTypeFromBuffer(data);
  if (type && IMAGES[type.mime]) return { ok: true, contentType: type.mime, extension: IMAGES[type.mime]! };
  if (looksLikeMarkup(data)) return { ok: false, reason: 'this file is SVG or other markup, not a photo; upload a JPEG or PNG' };
  return { ok: false, reason: `a photo must be a JPEG or PNG image; this file is ${type ? `${type.mime}` : 'not an image'}` };
}

/**
 * CSV: plain UTF-8 text. Rejected when file-type recognises a binary format (a PNG renamed .csv), when it
 * has NUL bytes or invalid UTF-8, or when it is markup (SVG, HTML, XML).
 */
export async function sniffCsv(data: Buffer): Promise<Sniffed> {
  const type = await fileTypeFromBuffer(data);
  if (type) return { ok: false, reason: `this file is ${type.mime} (.${type.ext}), not a CSV text file` };
  if (data.includes(0)) return { ok: false, reason: 'this file has binary content, not CSV text' };
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(data);
  } catch {
    return { ok: false, reason: 'this file is not UTF-8 text; save the CSV as UTF-8' };
  }
  if (looksLikeMarkup(data)) return { ok: false, reason: 'this file is SVG, HTML or XML markup, not CSV' };
  return { ok: true, contentType: 'text/csv; charset=utf-8', extension: 'csv' };
}

function looksLikeMarkup(data: Buffer): boolean {
  const head = data.subarray(0, 2048).toString('utf8').replace(/^\uFEFF/, '').trimStart().toLowerCase();
  return head.startsWith('<') || /<svg[\s>]/.test(head) || /<!doctype/.test(head) || /<script[\s>]/.test(head);
}
