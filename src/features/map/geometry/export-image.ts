/**
 * Turns the figure into a standalone SVG document: the live SVG, with the canvas points laid
 * in as an image, and the fonts named so other programs fall back gracefully.
 */
export function figureToSvg(svg: SVGSVGElement, canvas: HTMLCanvasElement | null): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  clone.setAttribute('font-family', "'IBM Plex Sans', sans-serif");
  const width = svg.viewBox.baseVal?.width || svg.clientWidth;
  const height = svg.viewBox.baseVal?.height || svg.clientHeight;
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(height));
  if (canvas) {
    const image = document.createElementNS('http://www.w3.org/2000/svg', 'image');
    image.setAttribute('href', canvas.toDataURL('image/png'));
    image.setAttribute('x', canvas.dataset.offsetX ?? '0');
    image.setAttribute('y', canvas.dataset.offsetY ?? '0');
    image.setAttribute('width', String(canvas.clientWidth));
    image.setAttribute('height', String(canvas.clientHeight));
    const anchor = clone.querySelector('[data-points-layer]');
    (anchor ?? clone).appendChild(image);
  }
  return new XMLSerializer().serializeToString(clone);
}

/** Renders an SVG document to a PNG blob at `scale` × its size. */
export async function svgToPng(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the figure could not be rendered'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d')!;
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, canvas.width, canvas.height);
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('PNG encoding failed'))), 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

export function download(name: string, blob: Blob) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
