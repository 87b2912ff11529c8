import { Resvg } from '@resvg/resvg-js';

/** A picture rendered by resvg (an SVG renderer from the npm registry, independent of our writer). */
export interface Rendered {
  readonly png: Buffer;
  readonly width: number;
  readonly height: number;
  /** RGBA, 8 bits each, row-major. */
  readonly pixels: Buffer;
}

/**
 * Renders SVG text to PNG at its stated size. The generic sans-serif family
 * is mapped to DejaVu Sans, the font Debian's node image ships.
 */
export function renderPng(svg: string): Rendered {
  const resvg = new Resvg(svg, {
    background: '#ffffff',
    font: { loadSystemFonts: true, sansSerifFamily: 'DejaVu Sans', defaultFontFamily: 'DejaVu Sans' },
  });
  const image = resvg.render();
  return { png: image.asPng(), width: image.width, height: image.height, pixels: image.pixels };
}

/** Share of pixels that differ from white, and the number of distinct RGB values. */
export function inkStatistics(rendered: Rendered): { inkShare: number; distinct: number } {
  const { pixels } = rendered;
  let ink = 0;
  const seen = new Set<number>();
  for (let i = 0; i < pixels.length; i += 4) {
    const rgb = (pixels[i]! << 16) | (pixels[i + 1]! << 8) | pixels[i + 2]!;
    if (rgb !== 0xffffff) ink++;
    seen.add(rgb);
  }
  return { inkShare: ink / (pixels.length / 4), distinct: seen.size };
}
