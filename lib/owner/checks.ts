import type { NextCheck } from "@/lib/diagnosis/next-check";

/** The next check, told to an owner: what it is and why we do it. */
export interface OwnerCheckText {
  title: string;
  text: string;
}

export const OWNER_CHECKS: Readonly<Record<NextCheck["check"], OwnerCheckText>> = {
  look_for_sealant: {
    title: "Look for leak sealant",
    text: "Before we connect anything, we look for signs of leak sealant. Sealant can block the system and damage our machines.",
  },
  static_repeat: {
    title: "Read the pressure at rest again",
    text: "The first reading was taken too soon. We let the car stand longer and read the pressure again.",
  },
  cycling_points: {
    title: "Watch the compressor switch on and off",
    text: "We note the gauge at the moment the compressor switches off and again when it switches back on.",
  },
  drain_compressor_oil: {
    title: "Measure the compressor oil",
    text: "With the refrigerant out, we drain the oil from the compressor and measure it against the maker's amount.",
  },
  repair_path: {
    title: "Repair before running",
    text: "The system must not run as it is. We find and fix the problem, fill it with the right amount of refrigerant, and only then test it running.",
  },
  static_pressure: {
    title: "Read the pressure at rest",
    text: "With the engine off and cooled down, we read the pressure inside the system. We compare it with the air around the car. That shows whether air has got in.",
  },
  identify_refrigerant: {
    title: "Test the gas",
    text: "We take a small sample and test which gas is inside and how pure it is. We do this before any of it goes into our machines.",
  },
  condenser_fan: {
    title: "Check the fan",
    text: "We check that the fan at the front of the car runs when the A/C is on.",
  },
  vent_temperature: {
    title: "Measure the air at the vents",
    text: "We run the A/C for a few minutes and measure how cold the air from the middle vent is.",
  },
  running_pressures: {
    title: "Read the pressures while it runs",
    text: "We connect gauges and read the pressure on both sides of the system while it runs.",
  },
  liquid_line_temperature: {
    title: "Check a pipe at the front",
    text: "We measure how warm one pipe near the condenser is. With the gauge, this tells us if the amount of refrigerant is right.",
  },
  suction_line_temperature: {
    title: "Check a pipe near the dash",
    text: "We measure how cold the pipe leaving the evaporator is. This shows if the cold side gets enough refrigerant.",
  },
  condenser_water_spray: {
    title: "Cool the condenser with water",
    text: "We spray water on the condenser and watch the gauge. If the pressure drops a lot, the condenser was short of air.",
  },
  watch_low_side: {
    title: "Watch the gauge for longer",
    text: "We run the A/C for fifteen minutes and watch one gauge. If it swings down and back, ice is forming inside.",
  },
  txv_bulb_test: {
    title: "Test the expansion valve",
    text: "We warm and chill the valve's sensor and watch whether the valve answers.",
  },
  liquid_line_survey: {
    title: "Look for a cold spot on a pipe",
    text: "We check how warm one pipe is along its length. A sudden cold spot shows where it is blocked.",
  },
  recover_and_weigh: {
    title: "Take out and weigh the refrigerant",
    text: "We take the refrigerant out with our machine and weigh it against the maker's label. This is the surest way to know if there was too much or too little.",
  },
  leak_test: {
    title: "Find the leak",
    text: "We search for the leak with a detector, a safe test gas or dye. We check each find a second way.",
  },
  confirm: {
    title: "Confirm and repair",
    text: "The tests point to one cause. We confirm it as we do the repair.",
  },
};
