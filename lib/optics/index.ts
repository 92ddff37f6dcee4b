// Small optical formulas the planner shows beside a train. Millimetres unless a name says
// otherwise. Pure functions: no framework, no I/O.

/** Millimetres per inch, exact by the 1959 international yard and pound agreement. */
export const MM_PER_INCH = 25.4;

/** Arcseconds per radian: 180/π · 3600. */
const ARCSEC_PER_RAD = (180 / Math.PI) * 3600;

function requirePositive(value: number, what: string): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${what} must be a positive number`);
}

function requireNonNegative(value: number, what: string): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${what} must be zero or more`);
}

export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/**
 * How far a plane-parallel plate (a filter, a sensor window) in a converging beam pushes
 * the focus away from the optics: Δ = t·(n − 1)/n.
 */
export function filterShiftMm(thicknessMm: number, refractiveIndex = 1.5): number {
  requireNonNegative(thicknessMm, "Filter thickness");
  if (!Number.isFinite(refractiveIndex) || refractiveIndex < 1) throw new RangeError("Refractive index must be at least 1");
  return (thicknessMm * (refractiveIndex - 1)) / refractiveIndex;
}

/** The shifts of every plate in the beam at once add up. */
export function totalFilterShiftMm(filters: readonly { thicknessMm: number; refractiveIndex?: number }[]): number {
  let sum = 0;
  for (const f of filters) sum += filterShiftMm(f.thicknessMm, f.refractiveIndex ?? 1.5);
  return sum;
}

/**
 * The clear aperture a part needs, at distance d in front of the sensor, so that the
 * sensor's corners still see the whole cone of a beam at focal ratio N: diagonal + d/N.
 * Conservative: exact when the exit pupil is far away.
 */
export function requiredClearApertureMm(sensorDiagonalMm: number, distanceToSensorMm: number, focalRatio: number): number {
  requireNonNegative(sensorDiagonalMm, "Sensor diagonal");
  requireNonNegative(distanceToSensorMm, "Distance to the sensor");
  requirePositive(focalRatio, "Focal ratio");
  return sensorDiagonalMm + distanceToSensorMm / focalRatio;
}

/**
 * The inverse of requiredClearApertureMm: the farthest in front of the sensor a part with
 * this clear aperture can stand before it cuts the cone, (aperture − diagonal)·N. Negative
 * when the part is narrower than the sensor diagonal (it vignettes anywhere).
 */
export function farthestUnvignettedMm(clearApertureMm: number, sensorDiagonalMm: number, focalRatio: number): number {
  requireNonNegative(sensorDiagonalMm, "Sensor diagonal");
  requirePositive(focalRatio, "Focal ratio");
  if (!Number.isFinite(clearApertureMm)) throw new RangeError("Clear aperture must be a number");
  return (clearApertureMm - sensorDiagonalMm) * focalRatio;
}

/**
 * Critical focus zone, total depth in micrometres. Factor used: 4.88·λ·N² (the total
 * depth for a quarter-wave focus error); other sources use 2·λ·N² or 2.44·λ·N², so the
 * number is a guide to how fine focusing must be, not a tolerance for spacing.
 */
export function criticalFocusZoneUm(focalRatio: number, wavelengthUm = 0.55): number {
  requirePositive(focalRatio, "Focal ratio");
  requirePositive(wavelengthUm, "Wavelength");
  return 4.88 * wavelengthUm * focalRatio * focalRatio;
}

/** Sky angle covered by one pixel: 206.265 × pixel (µm) / focal length (mm). */
export function plateScaleArcsecPerPixel(pixelUm: number, focalLengthMm: number): number {
  requirePositive(pixelUm, "Pixel size");
  requirePositive(focalLengthMm, "Focal length");
  return (ARCSEC_PER_RAD * pixelUm) / (focalLengthMm * 1000);
}

/** Angular field along one sensor dimension: 2·atan(s / 2f), in degrees. */
export function fieldOfViewDeg(sensorMm: number, focalLengthMm: number): number {
  requireNonNegative(sensorMm, "Sensor size");
  requirePositive(focalLengthMm, "Focal length");
  return (2 * Math.atan(sensorMm / (2 * focalLengthMm)) * 180) / Math.PI;
}

export function sensorDiagonal(widthMm: number, heightMm: number): number {
  requireNonNegative(widthMm, "Sensor width");
  requireNonNegative(heightMm, "Sensor height");
  return Math.hypot(widthMm, heightMm);
}

export function focalRatio(focalLengthMm: number, apertureMm: number): number {
  requirePositive(focalLengthMm, "Focal length");
  requirePositive(apertureMm, "Aperture");
  return focalLengthMm / apertureMm;
}
