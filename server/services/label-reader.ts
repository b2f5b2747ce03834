/**
 * Reads a photo of a Nutrition Facts panel: sharp decodes and prepares it (size-limited, upright,
 * grayscale, small images enlarged), tesseract.js reads it in its own worker thread, and
 * shared/label-text.ts turns the text into the label form's fields. Nothing is saved here.
 *
 * The English model comes from the npm package @tesseract.js-data/eng and tesseract's core from
 * tesseract.js-core, both in node_modules: `langPath` points at the package's folder and caching is
 * off, so the worker never fetches anything (tesseract.js would otherwise download from a CDN).
 */
import { createRequire } from 'node:module';
import path from 'node:path';
import sharp, { type Metadata } from 'sharp';
import { createWorker, OEM, PSM, type Worker } from 'tesseract.js';
import { mergeReadings, readLabelText } from '../../shared/label-text';
import type { LabelScanResponse } from '../../shared/schemas/foods';
import { HttpError, badRequest } from '../lib/http-error';

export const MAX_LABEL_PHOTO_BYTES = 8 * 1024 * 1024;
/** decoded pixels refused above this (a 12-megapixel phone photo is well under) */
const MAX_INPUT_PIXELS = 40_000_000;
/**
 * tesseract's LSTM model misreads small bold digits ("45g" as "459g"); enlarging a photo to at least
 * this width fixed every such slip on the tuning panels (tests/api/label-scan-ocr.test.ts), while
 * contrast stretching (normalise) made them worse.
 */
const MIN_WIDTH_PX = 3000;
const MAX_EDGE_PX = 4000;

const require = createRequire(import.meta.url);

/** The folder holding eng.traineddata.gz (LSTM, integer model: the one for OEM.LSTM_ONLY). */
export function englishModelDir(): string {
  return path.join(path.dirname(require.resolve('@tesseract.js-data/eng/package.json')), '4.0.0_best_int');
}

export function workerOptions() {
  return {
    langPath: englishModelDir(),
    gzip: true,
    cacheMethod: 'none',
    // a failed job is reported through its promise, never thrown inside the worker's message handler
    errorHandler: () => {},
  } as const;
}

let worker: Promise<Worker> | null = null;
let queue: Promise<unknown> = Promise.resolve();

/** One shared worker, created on the first scan; scans run one at a time in it. */
function getWorker(): Promise<Worker> {
  if (!worker) {
    worker = (async () => {
      const w = await createWorker('eng', OEM.LSTM_ONLY, workerOptions());
      await w.setParameters({ user_defined_dpi: '300', preserve_interword_spaces: '1' });
      return w;
    })();
    worker.catch(() => {
      worker = null;
    });
  }
  return worker;
}

export async function closeLabelReader() {
  const w = worker;
  worker = null;
  if (w) await (await w.catch(() => null))?.terminate();
}

/** Decoded safely and made easy to read: upright, flattened on white, grayscale, sized for OCR. */
export async function prepareLabelImage(buffer: Buffer): Promise<Buffer> {
  let meta: Metadata;
  try {
    meta = await sharp(buffer, { limitInputPixels: MAX_INPUT_PIXELS }).metadata();
  } catch {
    throw badRequest('This file is not a photo. Take a picture of the Nutrition Facts panel, or upload a JPEG, PNG or WebP image.', {
      fieldErrors: { image: ['This file is not a photo.'] },
    });
  }
  if (!meta.width || !meta.height || !meta.format || meta.format === 'svg' || meta.format === 'pdf') {
    throw badRequest('This file is not a photo. Take a picture of the Nutrition Facts panel, or upload a JPEG, PNG or WebP image.', {
      fieldErrors: { image: ['This file is not a photo.'] },
    });
  }
  if (meta.width * meta.height > MAX_INPUT_PIXELS) {
    throw new HttpError(413, 'payload_too_large', 'This photo has too many pixels; take it again at a lower resolution.');
  }
  const rotated = meta.orientation && meta.orientation >= 5;
  const width = rotated ? meta.height : meta.width;
  const height = rotated ? meta.width : meta.height;
  const scale = Math.min(Math.max(1, MIN_WIDTH_PX / width), MAX_EDGE_PX / Math.max(width, height));
  try {
    return await sharp(buffer, { limitInputPixels: MAX_INPUT_PIXELS })
      .rotate()
      .flatten({ background: '#ffffff' })
      .grayscale()
      .resize({ width: Math.round(width * scale), kernel: 'lanczos3' })
      .png({ compressionLevel: 1 })
      .toBuffer();
  } catch {
    throw badRequest('This photo could not be decoded; it may be damaged. Take it again.', { fieldErrors: { image: ['Could not be decoded.'] } });
  }
}

/** OCR of a prepared image, queued behind any scan already running. */
async function recognise(image: Buffer, psm: PSM = PSM.SINGLE_BLOCK): Promise<{ text: string; confidence: number }> {
  const run = queue.then(async () => {
    const w = await getWorker();
    await w.setParameters({ tessedit_pageseg_mode: psm });
    const { data } = await w.recognize(image);
    return { text: data.text, confidence: data.confidence };
  });
  queue = run.catch(() => {});
  return run;
}

/**
 * One reading as a single block of text; when fields are missing or doubtful, a second one at a larger
 * scale with automatic page layout (side-by-side columns), the two combined (mergeReadings).
 */
export async function readLabelPhoto(buffer: Buffer): Promise<LabelScanResponse> {
  const image = await prepareLabelImage(buffer);
  let ocr: { text: string; confidence: number };
  let reading;
  try {
    ocr = await recognise(image);
    reading = readLabelText(ocr.text);
    if (reading.found.length >= 2 && (reading.found.length < 10 || reading.doubtful.length > 0)) {
      const { width } = await sharp(image).metadata();
      const larger = await sharp(image)
        .resize({ width: Math.round((width ?? MIN_WIDTH_PX) * 1.25) })
        .png({ compressionLevel: 1 })
        .toBuffer();
      const second = await recognise(larger, PSM.AUTO);
      reading = mergeReadings(reading, readLabelText(second.text));
      ocr = { text: `${ocr.text}\n${second.text}`, confidence: (ocr.confidence + second.confidence) / 2 };
    }
  } catch (error) {
    throw new HttpError(
      503,
      'ocr_failed',
      `The label could not be read this time (${String((error as Error)?.message ?? error).slice(0, 120)}). Try again, or type the numbers in.`,
    );
  }
  const amounts = reading.found.filter((f) => f !== 'servingLabel' && f !== 'servingSizeG' && f !== 'servingSizeMl');
  if (amounts.length < 2) {
    throw new HttpError(
      422,
      'no_label_found',
      'No Nutrition Facts panel could be read in this photo. Fill the frame with the panel, hold the phone straight, and avoid glare — or type the numbers in.',
      {
        text: ocr.text.trim().slice(0, 2000),
      },
    );
  }
  return {
    fields: reading.fields,
    confidence: Math.round((ocr.confidence / 100) * (reading.found.length / 10) * 1000) / 1000,
    text: ocr.text.trim(),
    notes: reading.notes,
  };
}
