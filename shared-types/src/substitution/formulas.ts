// Circuit formulas the position ranking and the optocoupler estimate are built on. Plain SI units throughout.

/** The slew rate a sine of `peakVolts` at `frequencyHz` needs without distorting: SR = 2π·f·Vpeak, in V/s. */
export function requiredSlewRate(peakVolts: number, frequencyHz: number): number {
  return 2 * Math.PI * frequencyHz * Math.abs(peakVolts);
}

/** Current through an LED and its series resistor: (Vout − Vf)/R, and 0 when the output cannot reach Vf. */
export function ledCurrent(outputVolts: number, forwardVolts: number, seriesOhms: number): number {
  return outputVolts <= forwardVolts ? 0 : (outputVolts - forwardVolts) / seriesOhms;
}

/** Gain of an inverting stage: −Rf/Rin. Its magnitude may fall below one. */
export function invertingGain(feedbackOhms: number, inputOhms: number): number {
  return -feedbackOhms / inputOhms;
}

/** Gain of a non-inverting stage: 1 + Rf/Rg, never below one (Rg open makes a follower). */
export function nonInvertingGain(feedbackOhms: number, groundOhms: number): number {
  return Math.max(1, 1 + feedbackOhms / groundOhms);
}

/** −3 dB frequency of a first-order RC filter: 1/(2πRC). */
export function rcCutoff(ohms: number, farads: number): number {
  return 1 / (2 * Math.PI * ohms * farads);
}

/** Unloaded divider output, taken across the bottom resistor: Vs·Rbottom/(Rtop + Rbottom). */
export function dividerVoltage(supplyVolts: number, topOhms: number, bottomOhms: number): number {
  return (supplyVolts * bottomOhms) / (topOhms + bottomOhms);
}

/**
 * The input resistance an inverting stage needs for |gain| from gainMin to gainMax: R = Rf/|G|, so the highest
 * gain needs the lowest resistance.
 */
export function resistanceRangeForGain(feedbackOhms: number, gainMin: number, gainMax: number): { min: number; max: number } {
  const a = feedbackOhms / Math.abs(gainMax);
  const b = feedbackOhms / Math.abs(gainMin);
  return { min: Math.min(a, b), max: Math.max(a, b) };
}
