import { CAUSE_IDS, type CauseId } from "@/lib/diagnosis/causes";
import type { RepairId } from "@/lib/repairs/catalog";
import type { OwnerFacts } from "./facts";

/** One cause, told to someone with no trade knowledge. Each part is a short paragraph. */
export interface OwnerCauseText {
  title: string;
  /** One sentence that says what we found. */
  headline: string;
  /** What it is. */
  what: (facts: OwnerFacts) => string;
  /** What it does to comfort. */
  comfort: string;
  /** What it does to the compressor. */
  compressor: (facts: OwnerFacts) => string;
  /** What it means for safety; general cautions are added once per page. */
  safety: (facts: OwnerFacts) => string;
  /** What the repair involves. */
  repair: (facts: OwnerFacts) => string;
  /** The catalogue repairs a shop usually proposes for it. */
  repairs: (facts: OwnerFacts) => RepairId[];
  /** What to watch for afterwards. */
  watch: string;
}

const meteringPart = (facts: OwnerFacts) =>
  facts.expansionDevice === "orifice_tube"
    ? "orifice tube"
    : facts.expansionDevice === "txv"
      ? "expansion valve"
      : "expansion valve or orifice tube";

export const OWNER_CAUSES: Readonly<Record<CauseId, OwnerCauseText>> = {
  overcharge: {
    title: "Too much refrigerant",
    headline: "Your A/C has too much refrigerant in it.",
    what: () =>
      "Your A/C holds more refrigerant than it was built for. This often happens when a system is topped up without being emptied and weighed first.",
    comfort:
      "With too much inside, the system cannot get rid of heat well. The air feels warm, most of all in traffic or on hot days.",
    compressor: () =>
      "The extra pressure makes the compressor work hard. Over time this wears it out, and a safety switch may turn it off.",
    safety: () =>
      "The system runs at a higher pressure than it should. A safety switch guards it, but the fix should not wait long.",
    repair: () => "We empty the system and weigh back in the exact amount the maker asks for.",
    repairs: () => ["recover_evacuate_recharge"],
    watch: "The air should now stay cold in traffic. If it turns warm again, call us.",
  },
  undercharge: {
    title: "Low on refrigerant, from a leak",
    headline: "Your A/C is low on refrigerant because of a leak.",
    what: () =>
      "Your system has lost some of its refrigerant. It is a sealed loop, so a loss means there is a leak somewhere.",
    comfort:
      "With too little inside, the air is not as cold. It may feel fine on the road and warm when you stop.",
    compressor: () =>
      "The oil that keeps the compressor alive travels with the refrigerant. Running it low wears the compressor out. If the air blows warm, turn the A/C off until it is fixed.",
    safety: () =>
      "Refrigerant should not leak into the air. That is why we fix the leak and do not just top it up.",
    repair: () =>
      "We find and fix the leak. Then we empty the system, pump it to a vacuum, and refill it by weight.",
    repairs: () => ["leak_repair", "recover_evacuate_recharge"],
    watch:
      "If the air turns warm again in the next weeks or months, call us. That would point to a second leak.",
  },
  non_condensables: {
    title: "Air inside the system",
    headline: "Air has got into your A/C system.",
    what: () =>
      "Air has got into the sealed loop, where it does not belong. It gets in through a leak, or when a repair is done without pumping the air out first.",
    comfort: "Air takes up room the refrigerant needs. The system cools less, most of all on hot days.",
    compressor: () => "Air raises the pressure, so the compressor works harder and runs hotter.",
    safety: () =>
      "Air often brings water with it, and water causes rust inside the parts. The pressure may also run high.",
    repair: () =>
      "We empty the system and pump it to a deep vacuum to draw out all the air. Then we refill it by weight.",
    repairs: () => ["recover_evacuate_recharge", "replace_drier"],
    watch: "Cooling should now be strong on hot days. If it fades again, call us.",
  },
  moisture: {
    title: "Water inside the system",
    headline: "Water has got into your A/C system.",
    what: (facts) =>
      `A little water has got into the sealed loop. It can freeze into a plug of ice at the ${meteringPart(facts)}, a narrow part the refrigerant flows through.`,
    comfort:
      "The air is cold at first, then turns warm as the ice blocks the flow. After the car rests, the ice melts and it cools again.",
    compressor: () =>
      "Water mixes with the oil and slowly turns to acid. That acid eats away at the compressor and the seals.",
    safety: () => "This is no danger to you. But the harm inside grows the longer the water stays in.",
    repair: () =>
      "We empty the system and fit a new drier. We hold a deep vacuum for a long time to boil the water out. Then we refill it by weight.",
    repairs: () => ["recover_evacuate_recharge", "replace_drier"],
    watch: "On long drives the air should now stay cold. If it turns warm again after a while, call us.",
  },
  metering_restriction: {
    title: "A blocked valve or tube",
    headline: "A small valve or tube in your A/C is blocked.",
    what: (facts) =>
      `A small part sets how much refrigerant reaches the cold side of the system. In your car this is the ${meteringPart(facts)}. It is blocked or stuck shut.`,
    comfort: "Too little refrigerant gets through, so the air is not cold. You may see frost on a pipe.",
    compressor: () =>
      "Dirt in this part often comes from wear inside the compressor. We look at what is caught there to find out.",
    safety: () => "This is no danger to you. We find the cause so that the new part does not block again.",
    repair: (facts) =>
      `We replace the ${meteringPart(facts)}. If we find bits of metal, we also clean out the system.`,
    repairs: (facts) => [
      facts.expansionDevice === "orifice_tube" ? "replace_orifice_tube" : "replace_expansion_valve",
      "recover_evacuate_recharge",
    ],
    watch: "The air should now be cold at every speed. If frost or warm air comes back, call us.",
  },
  high_side_restriction: {
    title: "A blockage at the front of the system",
    headline: "Something blocks the flow at the front of your A/C.",
    what: () =>
      "Something blocks the flow in the parts at the front of the car. It may be in the condenser, the drier or a pipe.",
    comfort: "Less refrigerant reaches the cold side, so the air is warmer than it should be.",
    compressor: () => "The compressor pushes against the blockage and runs hot.",
    safety: () =>
      "Pressure can build up before the blockage. A safety switch guards against this, but it should be fixed soon.",
    repair: () => "We find the blocked part and replace it. If there is dirt in the system, we clean it out.",
    repairs: () => ["replace_drier", "recover_evacuate_recharge"],
    watch: "The air should now be cold at every speed. If it turns warm again, call us.",
  },
  metering_stuck_open: {
    title: "A valve stuck open",
    headline: "A valve in your A/C is stuck open.",
    what: () =>
      "The expansion valve lets too much refrigerant into the cold side. It is stuck open, or its sensor has come loose.",
    comfort: "The cold side floods, so cooling is weak. You may see frost on pipes under the hood.",
    compressor: () => "Liquid can reach the compressor. It is built to pump gas, so liquid can damage it.",
    safety: () => "This is no danger to you, but it is hard on the compressor.",
    repair: () =>
      "We check that the valve's sensor is tight and wrapped. If it is and the valve still floods, we fit a new valve and a new drier.",
    repairs: () => ["replace_expansion_valve", "replace_drier", "recover_evacuate_recharge"],
    watch: "The air should now be steady and cold. If you see frost under the hood again, call us.",
  },
  condenser_airflow: {
    title: "Not enough air through the condenser",
    headline: "Not enough air flows through the front of your A/C.",
    what: () =>
      "Air must flow through the condenser to carry the heat away. Something stops it: a fan that does not run, or dirt and leaves in front of it.",
    comfort:
      "It is worst when the car stands still, in traffic or at idle. That is when the fan has to do all the work.",
    compressor: () =>
      "The pressure climbs and the compressor works harder. A safety switch may turn it off for a while.",
    safety: () =>
      "The pressure runs high while the air cannot get through. A safety switch guards against this.",
    repair: () =>
      "We fix the fan or clean the condenser. If that cures it, the refrigerant does not need to be touched.",
    repairs: () => ["condenser_fan_repair", "clean_condenser"],
    watch: "The air should now stay cold in traffic. Keep the grille at the front free of leaves and snow.",
  },
  weak_compressor: {
    title: "The compressor is weak",
    headline: "The pump of your A/C, the compressor, is weak.",
    what: () =>
      "The compressor is the pump of the system, and yours is not pumping as it should. The cause may be wear inside, a slipping clutch or belt, or a control valve.",
    comfort: "Cooling is weak, most of all at idle.",
    compressor: () => "A worn compressor can shed bits of metal into the rest of the system.",
    safety: (facts) =>
      facts.electricCompressor
        ? "Your compressor runs on high voltage. Only trained staff should work on it."
        : "This is no danger to you. A failing compressor may get noisy before it stops.",
    repair: () =>
      "First we make sure the amount of refrigerant is right. Then we check the clutch, the belt and the control valve. Only then do we replace the compressor.",
    repairs: () => ["compressor_clutch_repair", "replace_compressor", "flush_system"],
    watch: "If you hear a new noise when the A/C is on, turn it off and call us.",
  },
  evaporator_icing: {
    title: "The cold part behind the dash freezes",
    headline: "The cold part of your A/C behind the dash freezes up.",
    what: () =>
      "The evaporator gets so cold that it freezes over. The switch that should stop this may have failed, or air cannot flow through it.",
    comfort: "The air is very cold at first. Then the flow gets weak as ice builds up.",
    compressor: () => "Ice can send liquid back toward the compressor, which is hard on it.",
    safety: () => "This is no danger to you. Ice can also drip water into the cabin as it melts.",
    repair: () =>
      "We check the cycling switch, its sensor and the cabin air filter. We replace the part that has failed.",
    repairs: () => ["cycling_control_repair", "replace_cabin_filter"],
    watch: "The airflow should now stay strong on long drives. If it gets weak again, call us.",
  },
  contaminated_refrigerant: {
    title: "The wrong or mixed refrigerant",
    headline: "Your A/C holds the wrong refrigerant, or a mix.",
    what: () =>
      "The gas in your system is not pure. Some other gas was added, maybe from a store can or at another shop.",
    comfort: "A mix does not cool as well as the right refrigerant.",
    compressor: () => "The wrong gas, or a sealer from a can, can harm the seals and the compressor.",
    safety: () => "Some gases sold for cars can catch fire. We handle a mix with care and never reuse it.",
    repair: () =>
      "We take out the mixed gas into a tank kept for waste. We clean the system and refill it with the right refrigerant.",
    repairs: () => ["contaminated_refrigerant_removal", "flush_system", "recover_evacuate_recharge"],
    watch: "Please have all future A/C work done with the refrigerant on the maker's label.",
  },
  oil_loss: {
    title: "Low or wrong compressor oil",
    headline: "The pump of your A/C is low on oil or has the wrong oil.",
    what: () =>
      "The compressor needs a set amount of a special oil. Yours has too little of it, or the wrong kind.",
    comfort: "You may not notice any change in cooling at first.",
    compressor: () => "Without the right oil the compressor wears fast and can seize.",
    safety: (facts) =>
      facts.electricCompressor
        ? "Your compressor runs on high voltage. The wrong oil can let that power leak, which is a real hazard."
        : "This is no danger to you, but a seized compressor can be costly.",
    repair: () => "We put in the oil the maker asks for, in the right amount.",
    repairs: () => ["oil_correction", "recover_evacuate_recharge"],
    watch: "If you hear a new noise when the A/C is on, turn it off and call us.",
  },
  no_refrigerant_fault: {
    title: "The sealed A/C loop is working",
    headline: "The sealed part of your A/C works as it should.",
    what: () =>
      "We tested the sealed part of your A/C and found it working well. The cause lies elsewhere, perhaps in the fans, the air doors or the controls.",
    comfort: "The loop itself makes cold air as it should.",
    compressor: () => "The compressor is doing its job.",
    safety: () => "We found nothing unsafe in the loop.",
    repair: () => "We look further at the airflow and the controls.",
    repairs: () => ["further_diagnosis"],
    watch: "If the air is still not cold where you want it, tell us when and where you notice it.",
  },
};

export function isCauseId(value: unknown): value is CauseId {
  return typeof value === "string" && (CAUSE_IDS as readonly string[]).includes(value);
}
