/**
 * The losses between shaft and terminals besides I^2 R: stator iron, eddy currents in air-cored conductors, bearing
 * friction, windage, and the third-harmonic current circulating in a delta. Every figure is &gt;= 0 and in SI units.
 *
 * <p><b>Iron.</b> {@link coilwright.losses.ElectricalSteel} separates loss by Bertotti (1988): hysteresis
 * k_h f B^a, classical eddy pi^2 d^2 (f B)^2 / (6 rho_e delta) from the sheet thickness and resistivity, and excess
 * k_e (f B)^1.5 set to equal the classical loss at 1.5 T, 50 Hz; k_h and a fit the two guaranteed maxima of
 * EN 10106 / IEC 60404-8-4 (1.0 and 1.5 T at 50 Hz; the grade name states the 1.5 T figure). The fit reproduces the
 * standard's 60 Hz maxima within about 1.5 % (see ElectricalSteelsReferenceTest).
 * {@link coilwright.losses.ElectricalSteels} lists M270-35A to M1000-65A and a conservative "unknown motor lamination" (11 W/kg at 1.5 T). Tooth and yoke flux
 * densities come from the gap field ({@link coilwright.losses.CoreFlux}); {@link coilwright.losses.IronLoss} applies
 * the separation at f = p n / 60 with a build factor (default 1.5) for punching, pressing and non-sinusoidal flux.
 * Uncertainty about +-30 %.
 *
 * <p><b>Conductor eddy loss.</b> {@link coilwright.losses.ConductorEddyLoss}: P = pi l d^4 omega^2 B^2 / (128 rho)
 * per round conductor (Sullivan 1999), summed over the harmonics of the 2-D field in the coil layer of an air-cored
 * dual rotor, both field components. Per copper volume it grows as d^2 f^2, so n strands in hand of the same copper
 * carry 1/n of it. Valid while the strand is thinner than the skin depth (reported). Slotted stators: the field in
 * the slots is small and this loss is neglected.
 *
 * <p><b>Friction and windage.</b> {@link coilwright.losses.Bearing}: SKF simplified model M = 0.5 mu P d plus seal
 * drag; {@link coilwright.losses.ShaftFriction}: running and break-away (2x) torque, or the user's own.
 * {@link coilwright.losses.Windage}: free discs (Cochran / von Karman moment coefficients), enclosed discs (Daily &amp;
 * Nece 1960, four regimes), rotors in an air gap (Bilgen &amp; Boulos 1973).
 *
 * <p><b>Delta circulating current.</b> {@link coilwright.losses.DeltaCirculation}: I3 = E3 / |R + j 3 omega L0|,
 * loss 3 I3^2 R, drag torque loss / omega, with L0 from {@link coilwright.losses.ZeroSequenceInductance}: a share of
 * the phase inductance by winding type with its band (air-cored 0.7 to 1.2, tooth coils 0.5 to 1.0, distributed 0.1
 * to 0.5; from memory), so the current is reported as a value and a range.
 */
package coilwright.losses;
