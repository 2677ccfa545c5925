/**
 * "Save picture": the scene drawn at twice the size of the picture on screen, its visible labels
 * drawn in at the same places, and a caption strip under it naming the bridge, the revision, the
 * view, the vertical exaggeration and the date, with the geometry-only caution. Browser only.
 */
import type { LabelReport, PictureReport } from './stats';

export const PICTURE_CAUTION =
  'Geometry only: bracket capacity, spacing, tie-back and fall protection follow the engineered falsework design, the maker\u2019s limits, the agency\u2019s specifications and local codes. The engineer of record decides; check against the plans.';

/**
 * The app's type for the picture's words. The family name is quoted: unquoted, "3" makes the whole
 * canvas `font` value invalid and the canvas silently keeps its 10 px default.
 */
export const PICTURE_FONT = '"Source Sans 3", system-ui, sans-serif';

export interface PictureCaption {
  bridge: string;
  revision: number | null;
  view: string;
  exaggeration: number;
  date: Date;
}

/** One line of caption text, e.g. "Marlow Creek Overpass · revision 3 · Along the edge · heights ×8 · 2026-12-02". */
export function captionText(c: PictureCaption): string {
  const day = `${c.date.getFullYear()}-${String(c.date.getMonth() + 1).padStart(2, '0')}-${String(c.date.getDate()).padStart(2, '0')}`;
  const parts = [c.bridge];
  if (c.revision !== null) parts.push(`revision ${c.revision}`);
  parts.push(c.view, c.exaggeration > 1 ? `heights \u00d7${c.exaggeration}` : 'true scale', day);
  return parts.join(' \u00b7 ');
}

/** A file name from the caption's parts: letters, digits and dashes only. */
export function pictureFileName(c: PictureCaption): string {
  const slug = (s: string) =>
    s
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '');
  return `${slug(c.bridge) || 'bridge'}${c.revision !== null ? `-r${c.revision}` : ''}-${slug(c.view)}.png`;
}

function wrap(ctx: CanvasRenderingContext2D, text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    const next = line ? `${line} ${word}` : word;
    if (ctx.measureText(next).width > width && line) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * Composes the saved picture from the enlarged scene (`scene`, `scale` × the on-screen size), the
 * labels as placed on screen (CSS px) and the caption. Returns the canvas and what it holds.
 */
export function composePicture(scene: HTMLCanvasElement, scale: number, labels: readonly LabelReport[], caption: PictureCaption): { canvas: HTMLCanvasElement; report: PictureReport } {
  const w = scene.width;
  const font = PICTURE_FONT;
  const pad = 14 * scale;
  const text = captionText(caption);
  const measure = document.createElement('canvas').getContext('2d')!;
  // On a narrow (phone) picture the caption wraps like the caution instead of being squeezed.
  measure.font = `700 ${15 * scale}px ${font}`;
  const captionLines = wrap(measure, text, w - pad * 2);
  measure.font = `${12 * scale}px ${font}`;
  const cautionLines = wrap(measure, PICTURE_CAUTION, w - pad * 2);
  const captionHeight = captionLines.length * 20 * scale + 4 * scale;
  const strip = Math.round(pad * 2 + captionHeight + cautionLines.length * 16 * scale);
  const canvas = document.createElement('canvas');
  canvas.width = w;
  canvas.height = scene.height + strip;
  const ctx = canvas.getContext('2d')!;
  ctx.drawImage(scene, 0, 0);
  ctx.textBaseline = 'middle';
  for (const l of labels) {
    const bent = l.kind === 'bent';
    ctx.fillStyle = bent ? 'rgba(36, 34, 31, 0.85)' : 'rgba(255, 255, 255, 0.7)';
    ctx.fillRect(l.x * scale, l.y * scale, l.w * scale, l.h * scale);
    ctx.fillStyle = bent ? '#ffffff' : '#0e4a42';
    ctx.font = `600 ${(l.h - 5) * scale * 0.8}px ${font}`;
    ctx.fillText(l.text, (l.x + (bent ? 6 : 4)) * scale, (l.y + l.h / 2) * scale, (l.w - 6) * scale);
  }
  ctx.fillStyle = '#f6f4ef';
  ctx.fillRect(0, scene.height, w, strip);
  ctx.fillStyle = '#d98e04';
  ctx.fillRect(0, scene.height, w, 3 * scale);
  ctx.fillStyle = '#24221f';
  ctx.textBaseline = 'top';
  ctx.font = `700 ${15 * scale}px ${font}`;
  captionLines.forEach((line, i) => ctx.fillText(line, pad, scene.height + pad + i * 20 * scale));
  ctx.font = `${12 * scale}px ${font}`;
  ctx.fillStyle = '#7a4a00';
  cautionLines.forEach((line, i) => ctx.fillText(line, pad, scene.height + pad + captionHeight + i * 16 * scale));
  return {
    canvas,
    report: {
      width: canvas.width,
      height: canvas.height,
      sceneWidth: scene.width,
      sceneHeight: scene.height,
      caption: text,
      caution: PICTURE_CAUTION,
      fileName: pictureFileName(caption),
    },
  };
}

/** Offers the canvas as a PNG download under `fileName`. */
export function downloadCanvas(canvas: HTMLCanvasElement, fileName: string): Promise<void> {
  return new Promise((resolve, reject) => {
    canvas.toBlob((blob) => {
      if (!blob) return reject(new Error('The picture could not be encoded'));
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = fileName;
      document.body.appendChild(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 10000);
      resolve();
    }, 'image/png');
  });
}
