package coilwright.cogging;

/**
 * One harmonic of the cogging torque.
 *
 * @param cyclesPerRevolution k = n LCM(Q, 2p), cycles per mechanical revolution
 * @param amplitudeNm         amplitude, N m (skew included)
 * @param skewFactor          sin(k theta_sk / 2) / (k theta_sk / 2) applied to it (1 without skew)
 */
public record CoggingHarmonic(int cyclesPerRevolution, double amplitudeNm, double skewFactor) {
}
