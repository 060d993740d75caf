/**
 * Steady winding and magnet temperatures from the losses: small lumped thermal networks per cooling arrangement and
 * the coupled electro-thermal fixed point.
 *
 * <p><b>Method.</b> Nodal thermal networks in the manner of Mellor, Roberts &amp; Turner (IEE Proc. B 138(5), 1991)
 * and Staton, Boglietti &amp; Cavagnino (IEEE Trans. Energy Convers. 20(3), 2005), reduced to the few paths that
 * carry the heat of a small generator ({@link coilwright.thermal.ThermalNetwork}, solved with a Commons Math LU):
 * <ul>
 * <li>{@link coilwright.thermal.DiscStatorThermal}: air-cored coils cast in resin between the two rotor discs of an
 *     axial machine (winding, stator faces, rotor);</li>
 * <li>{@link coilwright.thermal.SlottedStatorThermal}: a slotted stator in a housing, open ventilated or enclosed,
 *     or inside an outer rotor (winding, core, rotor, housing, internal air).</li>
 * </ul>
 * Conduction: the coil layer and the slot contents are slabs with uniform heating (mean rise Q t / 12 k A, hot spot
 * 1.5 times that), their conductivity across the wires by the Maxwell-Garnett (Rayleigh) formula from the resin or
 * varnish conductivity and the copper fill; slot liner, liner-to-iron and core-to-housing layers as thin resistances
 * ({@link coilwright.thermal.ThermalMaterials}). Convection ({@link coilwright.thermal.Convection}): natural
 * convection by Churchill &amp; Chu (1975), rotating discs by Cobb &amp; Saunders (1956), the air gap by Becker &amp;
 * Kaye (1962), end spaces by Schubert's correlation, a housing in the wind as a flat plate, forced and natural
 * blended with Churchill's cube rule; linearised radiation. The rotor's own air flow enters through its speed.
 * Air properties from Incropera &amp; DeWitt Table A.4 ({@link coilwright.thermal.Air}). Surface coefficients depend
 * on surface temperatures and are iterated to consistency.
 *
 * <p><b>Coupling.</b> {@link coilwright.thermal.WindingTemperature#solve} finds the winding temperature T at which
 * the losses of the operating point evaluated with the copper at T (resistance by IEC 60028) heat the winding to T
 * (Brent's method on r(T) = T_network(losses(T)) - T, bracketed upwards from ambient, so the lowest, physically
 * reached fixed point is found; runaway beyond 250 C is reported, not hidden).
 * {@link coilwright.thermal.WindingTemperature#solveNear} finds the same fixed point to the same accuracy from a
 * temperature near it by the secant method (two or three loss evaluations, each a re-solve of the operating point),
 * and falls back to the bracketing solve whenever the secant does not settle on a stable crossing.
 * {@link coilwright.thermal.InsulationLimit#firstCrossing} finds where along an operating curve the hot spot reaches
 * the IEC 60085 class limit. Ambient defaults to 25 C ({@link coilwright.thermal.CoolingConditions}).
 *
 * <p><b>Uncertainty.</b> Temperature rises are uncertain by about +-35 % (slotted) and +-40 % (disc stator): the
 * conductivities of impregnated windings and resins, the contact layers and the end-space coefficient dominate.
 * Pumped air through the running clearance of a disc machine and wind on its discs are not counted (errs hot); the
 * winding is one node (copper conducts along the turns far better than across). Transient heating (gusts) is not
 * modelled: the figures are for steady operation at each point.
 */
package coilwright.thermal;
