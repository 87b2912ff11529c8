/**
 * Unit-carrying number types. A brand makes the compiler refuse to pass a
 * margin in hertz where a level in decibels is expected; arithmetic on branded
 * values yields plain numbers, so results are re-branded where they are made.
 */
declare const unit: unique symbol;
type Quantity<U extends string> = number & { readonly [unit]: U };

/** A frequency or frequency difference in hertz. */
export type Hz = Quantity<'Hz'>;
/** A level or level ratio in decibels (dBFS, dBc or dB as the field says). */
export type Db = Quantity<'dB'>;
/** A relative frequency offset in parts per million. */
export type Ppm = Quantity<'ppm'>;
/** A time in seconds. */
export type Seconds = Quantity<'s'>;

/** Brands a number of hertz. */
export const hz = (value: number): Hz => value as Hz;
/** Brands a number of decibels. */
export const db = (value: number): Db => value as Db;
/** Brands a number of parts per million. */
export const ppm = (value: number): Ppm => value as Ppm;
/** Brands a number of seconds. */
export const seconds = (value: number): Seconds => value as Seconds;

/**
 * A relative offset as parts per million: 1e-6 is 1 ppm.
 *
 * @param fraction the offset relative to the nominal value (dimensionless)
 * @returns ppm
 * @example ppmOf(2000 / 100e6) // 20
 */
export const ppmOf = (fraction: number): Ppm => ppm(fraction * 1e6);
/**
 * Parts per million as a relative offset: 20 ppm is 2e-5.
 *
 * @param value ppm
 * @returns the relative offset (dimensionless)
 * @example fractionOf(ppm(20)) // 0.00002
 */
export const fractionOf = (value: Ppm): number => value * 1e-6;
