// PNG from the picture's SVG: the browser draws the SVG into a canvas at the
// chosen scale (a data URL, so the canvas stays readable), on white.

/** The SVG's own width and height attributes, px. */
function svgSize(svg: string): { width: number; height: number } {
  const head = /<svg\b[^>]*>/.exec(svg)?.[0] ?? '';
  const width = Number(/\bwidth="([\d.]+)"/.exec(head)?.[1]);
  const height = Number(/\bheight="([\d.]+)"/.exec(head)?.[1]);
  return { width: width > 0 ? width : 640, height: height > 0 ? height : 480 };
}

/** PNG of an SVG document, `scale` device pixels per SVG pixel. */
export async function svgToPng(svg: string, scale: number): Promise<Blob> {
  const { width, height } = svgSize(svg);
  const img = new Image();
  await new Promise<void>((resolve, reject) => {
    img.onload = () => resolve();
    img.onerror = () => reject(new Error('the browser could not draw the picture'));
    img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
  });
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('the browser gave no canvas to draw on');
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
  return new Promise<Blob>((resolve, reject) =>
    canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('the browser made no PNG'))), 'image/png'),
  );
}

/** Offer a blob as a file download. */
export function downloadBlob(fileName: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
