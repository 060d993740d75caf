/**
 * Worst-case demagnetisation: a sudden three-phase short circuit at the highest speed with the magnets at their
 * hottest (NdFeB) or coldest (ferrite) temperature.
 *
 * <p><b>Method.</b> Peak fault current by the IEC 60909-0 peak factor kappa = 1.02 + 0.98 exp(-3 R / X)
 * ({@link coilwright.demag.ShortCircuitCurrent}); the winding's fundamental MMF at that current taken fully against
 * the magnet; its field in the magnet through the magnetic circuit (magnet plus Carter-scaled gap, or half the gap of
 * a dual rotor); the magnet's own open-circuit field at its exposed edge or centre, whichever opposes more, from
 * the 2-D harmonic field solution; the sum against the knee of the intrinsic curve at the temperature, 0.9 HcJ(T),
 * with HcJ(T) from the grade's temperature coefficient ({@link coilwright.magnet.MagnetGrade#intrinsicCoercivityAt}). The margin is 1 - |H| / H_knee:
 * DANGER below 0, WARNING below 0.2 ({@link coilwright.demag.DemagnetisationCheck}).
 *
 * <p><b>Uncertainty.</b> The MMF alignment is the worst case; the open-circuit field is an average over a tenth of
 * the magnet width (sharp corners are worse still, locally); the knee ratio 0.9 and the coercivity
 * coefficients are typical data-sheet values (from memory). Treat a margin under 0.2 as a reason to choose a higher
 * coercivity class rather than as a precise limit.
 */
package coilwright.demag;
