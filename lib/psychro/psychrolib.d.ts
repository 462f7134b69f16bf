// The psychrolib package ships no types; only the calls Chillwright makes are declared.
declare module "psychrolib" {
  interface Psychrolib {
    SI: number;
    IP: number;
    SetUnitSystem(unitSystem: number): void;
    GetUnitSystem(): number;
    GetStandardAtmPressure(altitude: number): number;
    GetTDewPointFromRelHum(tDryBulb: number, relHum: number): number;
    GetTWetBulbFromRelHum(tDryBulb: number, relHum: number, pressure: number): number;
    GetSatVapPres(tDryBulb: number): number;
    GetHumRatioFromRelHum(tDryBulb: number, relHum: number, pressure: number): number;
  }
  const psychrolib: Psychrolib;
  export default psychrolib;
}
