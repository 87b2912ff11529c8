import { foldCycles } from './coherent-bins.js';
import type { CaptureTone } from './capture-tones.js';
import type { Coefficients } from './converter-polynomial.js';
import { productName, type InputIndex } from './family-lines.js';
import { enumerateProducts } from './mixing-products.js';
import type { CoreMismatch } from './interleave-mismatch.js';

/**
 * The key of the interleaving image at k/M·R + f of the product with net
 * multiples `net` (first nonzero positive): `i<k>:<net>`.
 *
 * @example imageKey(1, [1, 0]) // 'i1:1,0'
 */
export function imageKey(k: number, net: readonly number[]): string {
  return `i${k}:${net.join(',')}`;
}

/** One spectral component the capture's model expects, wherever it comes from. */
export interface ModelComponent {
  /** Same key as a LineDraft's component. */
  readonly key: string;
  /** In words: a product (`2·W1 − ADJ`) or a tone's label. */
  readonly name: string;
  /** Product order; 1 for a tone itself (input or added after the converter). */
  readonly order: number;
  /** Where it shows, 0..N/2. */
  readonly bin: number;
  readonly amplitude: number;
  /** A wanted tone itself: the signal, not a spur. */
  readonly wanted: boolean;
  /** For a wanted tone, the channel it belongs to (0: the wanted band, or the first channel). */
  readonly channel?: number;
}

/** The model's components and whether the list is complete (see enumerateProducts). */
export interface ModelComponents {
  readonly components: readonly ModelComponent[];
  readonly complete: boolean;
}

/**
 * Every component the model expects down to `cutoff`: the products of the
 * input tones through the polynomial (the tones themselves included, with
 * their compression), the tones added after the converter, and with
 * interleaved cores the images of every product at k/M·R + f.
 *
 * @param tones the capture's tones
 * @param index their input index
 * @param coefficients the polynomial
 * @param samples record length N
 * @param cutoff least amplitude kept
 * @param cores the mismatched cores of an interleaved converter and the rate R (Hz): the images of every product are components too; null for one core
 * @returns the components, and whether the product search ran to its end
 * @example modelComponents(tones, index, converterCoefficients(heronBase), 65536, 1e-8).components.some((c) => c.name === '2·W1') // true
 */
export function modelComponents(
  tones: readonly CaptureTone[],
  index: InputIndex,
  coefficients: Coefficients,
  samples: number,
  cutoff: number,
  cores: { readonly mismatch: CoreMismatch; readonly rate: number } | null = null,
): ModelComponents {
  const mismatch = cores?.mismatch ?? null;
  const amplitudes = index.inputs.map((i) => tones[i]!.amplitude);
  // Images are at most a factor below their source: search the products down to that much lower, keep the images above the cutoff.
  const factor = mismatch
    ? Math.max(1e-30, ...tones.filter((t) => t.input).map((t) => mismatch.imageFactor(t.frequency * (coefficients.length - 1))))
    : 1;
  const list = enumerateProducts(coefficients, amplitudes, mismatch ? Math.min(cutoff, cutoff / factor) : cutoff);
  const products = list.products.map((p) => {
    const cycles = p.net.reduce((sum, n, i) => sum + n * tones[index.inputs[i]!]!.cycles, 0);
    const single = p.order === 1 ? index.inputs[p.net.findIndex((n) => n !== 0)]! : -1;
    return {
      key: `n:${p.net.join(',')}`,
      name: productName(p.net, index, tones),
      order: p.order,
      bin: foldCycles(cycles, samples),
      amplitude: p.amplitude,
      wanted: single >= 0 && tones[single]!.source.kind === 'wanted',
      ...(single >= 0 && tones[single]!.source.kind === 'wanted' ? { channel: wantedChannel(tones[single]!) } : {}),
    };
  });
  const added = tones.flatMap((t, i) =>
    t.input ? [] : [{ key: `t:${i}`, name: t.label, order: 1, bin: foldCycles(t.cycles, samples), amplitude: t.amplitude, wanted: false }],
  );
  const images: ModelComponent[] = [];
  if (mismatch) {
    const rate = cores!.rate;
    list.products.forEach((p, j) => {
      const cycles = p.net.reduce((sum, n, i) => sum + n * tones[index.inputs[i]!]!.cycles, 0);
      const amplitude = p.amplitude * mismatch.imageFactor((cycles * rate) / samples);
      if (amplitude < cutoff) return;
      for (let k = 1; k < mismatch.ways; k++) {
        images.push({
          key: imageKey(k, p.net),
          name: `IL ${k}/${mismatch.ways} + (${products[j]!.name})`,
          order: p.order,
          bin: foldCycles(Math.round((k * samples) / mismatch.ways) + cycles, samples),
          amplitude,
          wanted: false,
        });
      }
    });
  }
  return { components: [...products.filter((p) => p.amplitude >= cutoff), ...added, ...images], complete: list.complete };
}

/** The channel of a wanted tone. */
function wantedChannel(tone: CaptureTone): number {
  return tone.source.kind === 'wanted' ? tone.source.channel : 0;
}
