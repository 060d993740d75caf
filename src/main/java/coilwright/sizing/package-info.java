/**
 * Sizing: from a drive (wind rotor, hydro runner or plain speed targets), a battery load, what can be built and the
 * limits to ranked alternators that meet them. Every candidate of a discrete space (slot/pole or coil/magnet layout,
 * magnets, turns, wire and strands, connection, parallel paths) is screened with closed forms that are exact or
 * proven bounds of the full model; the survivors are refined best first with the full model, so a screen never
 * discards a design the full model would accept and the returned ranking is the full model's.
 */
package coilwright.sizing;
