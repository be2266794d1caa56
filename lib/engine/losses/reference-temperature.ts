/**
 * The temperature stator I²R loss is reported at when the rated-load temperature has not been measured:
 * IEEE 112's specified temperature for the insulation system's thermal class,
 *
 *   class A (105) 75 °C · class B (130) 95 °C · class F (155) 115 °C · class H (180) 130 °C
 *
 * [from memory: IEEE 112 table of specified temperatures; IEC 60034-2-1 works from a measured or assigned
 * winding temperature instead]. Resistance is brought there with copper's 234.5 °C constant (IEEE practice):
 * R_ref = R_20·(234.5 + t_ref)/(234.5 + 20).
 */
import { COPPER_TEMP_CONSTANT_IEEE, REFERENCE_TEMPERATURE_C } from '../copper';
import { correctResistanceOhm } from '../resistance';

export type ThermalClass = 'A' | 'B' | 'F' | 'H';

export const SPECIFIED_TEMPERATURE_C: Record<ThermalClass, number> = { A: 75, B: 95, F: 115, H: 130 };

/** R at the class's specified temperature from R at 20 °C (234.5 °C constant). */
export const resistanceAtSpecifiedTemperatureOhm = (r20Ohm: number, thermalClass: ThermalClass): number =>
  correctResistanceOhm(r20Ohm, REFERENCE_TEMPERATURE_C, SPECIFIED_TEMPERATURE_C[thermalClass], COPPER_TEMP_CONSTANT_IEEE);
