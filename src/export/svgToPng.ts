/** Pixel size an SVG document declares on its root (width and height attributes). */
export function svgPixelSize(svg: string): { width: number; height: number } {
  const root = new DOMParser().parseFromString(svg, 'image/svg+xml').documentElement;
  const width = Number(root.getAttribute('width'));
  const height = Number(root.getAttribute('height'));
  if (!(width > 0 && height > 0)) throw new RangeError(`the figure has no pixel size (width ${String(width)}, height ${String(height)})`);
  return { width, height };
}

/**
 * A standalone SVG as a PNG at `scale` times its pixel size: the SVG is loaded into an image from a
 * blob URL (it names no outside resource, so the canvas stays readable), drawn onto a canvas of
 * width × scale by height × scale, and encoded by canvas.toBlob.
 */
export async function svgToPng(svg: string, scale: number): Promise<Blob> {
  if (!(Number.isInteger(scale) && scale >= 1 && scale <= 8)) throw new RangeError(`PNG scale must be a whole number from 1 to 8; got ${scale}`);
  const { width, height } = svgPixelSize(svg);
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    const image = new Image(width, height);
    // The load event, not image.decode(): decode() of an SVG image is the less trodden path in
    // browsers and, in one of our full browser-test runs, never delivered the PNG.
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the browser could not load the figure as an image'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('the browser gave no 2D canvas to draw the PNG on');
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => {
      canvas.toBlob((blob) => (blob === null ? reject(new Error('the browser could not encode the PNG')) : resolve(blob)), 'image/png');
    });
  } finally {
    URL.revokeObjectURL(url);
  }
}
