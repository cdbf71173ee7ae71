/** A one-sided spectrum of an acceleration record, on bins from 0 to the Nyquist frequency. */
export interface Spectrum {
  /** bin frequencies, Hz */
  frequencyHz: Float64Array
  /**
   * Squared magnitude: for a decay |X(f)|² with X the Fourier transform of acceleration,
   * (m/s)²; for an ambient record the power spectral density, (m/s²)²/Hz.
   */
  power: Float64Array
  /** spacing of the bins (after zero-padding), Hz */
  binHz: number
  /** spacing of independent spectral lines, Hz: 1/record length (decay) or fs/segment (ambient) */
  resolutionHz: number
  /** what √power is: Fourier amplitude (m/s) or amplitude spectral density (m/s²/√Hz) */
  quantity: 'fourier-amplitude' | 'amplitude-spectral-density'
  unit: 'm/s' | 'm/s²/√Hz'
  window: 'none' | 'exponential' | 'hann'
  /** decay rate added by an exponential window, 1/τ in 1/s (0 without one) */
  windowDecayRate: number
  /** samples per segment (the whole record for a decay) */
  segmentLength: number
  /** segments averaged (1 for a decay) */
  averages: number
}
