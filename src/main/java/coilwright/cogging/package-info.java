/**
 * Cogging torque of slotted surface-magnet machines: peak-to-peak, peak, period per revolution LCM(Q, 2p), the
 * effect of magnet arc and skew; zero, with the reason, for air-cored stators.
 *
 * <p><b>Method.</b> The no-load field by the subdomain model of Zhu, Wu, Xia &amp; Howe (IEEE Trans. Magn. 46(4),
 * 2010), written in Cartesian form over one periodic section (curvature neglected, as in the magnet package's field
 * model): Fourier series for the vector potential in the magnets, the air gap and each slot opening, joined by
 * continuity over the openings, solved once per design (Commons Math LU) and for many rotor positions. Torque from
 * the Maxwell stress in the gap; skew as a sin(x)/x factor on each harmonic (Zhu &amp; Howe, IEEE Trans. Energy
 * Convers. 15(4), 2000).
 *
 * <p><b>Checks.</b> A test-only finite-element solution of the same idealised geometry agrees within about 5 %
 * (its own grid converging from below); the optimum magnet arc of an integral-slot machine falls at about
 * n + 0.14 slot pitches as Li &amp; Slemon (IEEE Trans. Magn. 24(6), 1988) found; a skew of one slot pitch removes
 * it. The simpler relative-permeance energy method (Zhu &amp; Howe 1992) was tried first and overstated the
 * finite-element cogging of the same geometry about 4.7 times, so it is not used.
 *
 * <p><b>Assumptions.</b> Infinitely permeable linear iron, deep parallel slots at the opening, ideal magnets of
 * uniform thickness magnetised normal to the gap. Saturation, tooth-tip shape and tolerances are not modelled;
 * tolerances add cogging at other orders in real machines, so a near-zero figure is a lower bound.
 */
package coilwright.cogging;
