'use client';

import { useState, type RefObject } from 'react';
import type { PictureFn } from '../objects/PictureTaker';
import { composePicture, downloadCanvas, PICTURE_FONT, type PictureCaption } from '../picture';
import { sceneStats } from '../stats';

/** Twice the picture's size on screen. */
export const PICTURE_SCALE = 2;

/** "Save picture": draws, captions, reports (window.__chordlineStats.picture) and downloads the PNG. */
export function usePictureSaver(pictureRef: RefObject<PictureFn | null>, caption: Omit<PictureCaption, 'date'>) {
  const [message, setMessage] = useState('');
  const [busy, setBusy] = useState(false);
  const save = async () => {
    const draw = pictureRef.current;
    if (!draw) {
      setMessage('The 3D view is still loading; try again in a moment.');
      return;
    }
    setBusy(true);
    try {
      // The caption's weights of the app's type, loaded before the canvas draws with them.
      await Promise.all([
        document.fonts.load(`700 ${15 * PICTURE_SCALE}px ${PICTURE_FONT}`),
        document.fonts.load(`${12 * PICTURE_SCALE}px ${PICTURE_FONT}`),
        document.fonts.load(`600 ${12 * PICTURE_SCALE}px ${PICTURE_FONT}`),
      ]);
      const scene = draw(PICTURE_SCALE);
      const stats = sceneStats();
      const { canvas, report } = composePicture(scene, PICTURE_SCALE, stats.labels, { ...caption, date: new Date() });
      stats.picture = report;
      await downloadCanvas(canvas, report.fileName);
      setMessage(`Saved ${report.fileName} (${report.width} × ${report.height} px)`);
    } catch (err) {
      setMessage(`The picture could not be saved: ${err instanceof Error ? err.message : String(err)}`);
    } finally {
      setBusy(false);
    }
  };
  return { save, message, busy };
}
