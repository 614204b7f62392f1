/**
 * Safety cautions shown wherever Eavesight tells someone to do something physical (DESIGN.md §7).
 * Exported so the UI and the PDF print the same words.
 */

/** For any check or repair on a powered attic fan, its thermostat or its wiring. */
export const FAN_SAFETY_CAUTION =
  "Safety: switch the fan's circuit off at the breaker, lock or tag the breaker off so nobody switches it back on, and confirm the circuit is dead with a voltage tester that you prove on a known live source just before and just after (live-dead-live) before touching the fan, its thermostat or any wire. " +
  "Any wiring repair or replacement is work for a licensed electrician. " +
  "Attics get dangerously hot: work early in the day, bring water and limit your time up there. " +
  "Walk only on the framing (joists or truss chords), never on drywall or insulation between them. " +
  "Follow the manufacturer's instructions and local codes.";

/** For work in the attic that involves no electrical work. */
export const ATTIC_SAFETY_CAUTION =
  "Safety: attics get dangerously hot, so work early in the day and bring water; walk only on the framing, never on drywall or insulation between the joists; wear a dust mask around insulation.";

/** For anything done on the roof (cutting a ridge slot, installing box vents or fans). */
export const ROOF_SAFETY_CAUTION =
  "Safety: roof work needs fall protection; follow the manufacturer's installation instructions, local codes and the authority having jurisdiction.";

/** For any powered attic fan in a house, above all one with an atmospheric (natural-draft) gas appliance. */
export const COMBUSTION_SAFETY_CAUTION =
  "A powered attic fan can pull air out of the house through ceiling leaks and make a natural-draft gas water heater, furnace or boiler spill exhaust (carbon monoxide) into the living space. " +
  "Have a qualified technician run a combustion safety (worst-case depressurization and spillage) test with the fan running, air-seal the ceiling, and keep working carbon monoxide alarms.";

/** For the thermostat switching test, which is taken on a live circuit. */
export const LIVE_VOLTAGE_TEST_CAUTION =
  "The switching test is a live-voltage test: only a qualified person should do it, with a rated meter and insulated probes, touching no bare conductor; switch the breaker off again before disconnecting anything.";

/** For a motor run capacitor, which can hold a charge after the power is off. */
export const CAPACITOR_CAUTION =
  "A capacitor can hold a charge after the power is off: discharge it safely (a rated resistor across the terminals, never a screwdriver) before touching or measuring it.";
