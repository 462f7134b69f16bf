import psychrolib from "psychrolib";

/**
 * psychrolib keeps its unit system in one shared, mutable setting; selecting SI before every use
 * keeps Chillwright correct even if other code switches it.
 */
export function psychrolibSi() {
  if (psychrolib.GetUnitSystem() !== psychrolib.SI) psychrolib.SetUnitSystem(psychrolib.SI);
  return psychrolib;
}
