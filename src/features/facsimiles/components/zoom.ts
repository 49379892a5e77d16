/** Zoom is relative to a page's actual size (100 %); "fit" follows the viewer's width. */
export type Zoom = { mode: 'fit' } | { mode: 'fixed'; value: number };

export const zoomSteps = [0.25, 0.33, 0.5, 0.67, 0.75, 0.9, 1, 1.1, 1.25, 1.5, 1.75, 2, 2.5, 3, 4] as const;

export function stepZoom(current: number, direction: 1 | -1): number {
  if (direction > 0) return zoomSteps.find((s) => s > current + 0.001) ?? zoomSteps[zoomSteps.length - 1];
  return [...zoomSteps].reverse().find((s) => s < current - 0.001) ?? zoomSteps[0];
}

/** The zoom that makes a page of `pageWidth` px fill `available` px; clamped to the steps' range. */
export function fitZoom(available: number, pageWidth: number): number {
  if (!available || !pageWidth) return 1;
  return Math.min(zoomSteps[zoomSteps.length - 1], Math.max(zoomSteps[0], available / pageWidth));
}
