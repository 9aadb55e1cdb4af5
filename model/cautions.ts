// The cautions of the work, worded once: the setup card (page and PDF), the study page and the consult page
// import them from here. Each caution is usual workshop practice; none replaces local regulations, the kit
// maker's instructions or a qualified machinist.

export const CAUTION = {
  eyes: "Wear eye protection while cutting; aluminium chips fly. Wear it when blowing chips out too.",
  clamp: "Clamp the case securely without crushing it: an over-tightened case can crack.",
  unplug: "Unplug the drill before fitting, setting or checking the bit; unplug it to check the bit and every fastener during the cut.",
  shaft: "Keep sleeves, gloves and hair away from the turning shaft; hold the drill against its torque kick.",
  trialCut: "Take a shallow trial cut and measure it before going to full depth.",
  bearings: "Keep chips out of the bearings; never spin a bearing with compressed air.",
  chips: "Remove every chip from the crankcase before assembly: flush, blow out and look again.",
  legalClass: "A change of displacement can change the vehicle's legal class; local rules decide.",
  kitMaker: "Follow the kit maker's instructions; when in doubt, defer to a qualified machinist.",
} as const;

export type CautionKey = keyof typeof CAUTION;

/** The setup card's cautions, in the order of the work: dressed for it, case held, bit set, cutting, trial, cleaning, assembly. */
export const SETUP_CARD_CAUTIONS: readonly string[] = [
  CAUTION.eyes,
  CAUTION.clamp,
  CAUTION.unplug,
  CAUTION.shaft,
  CAUTION.trialCut,
  CAUTION.bearings,
  CAUTION.chips,
  CAUTION.legalClass,
  CAUTION.kitMaker,
];

/** The setup card's step for the trial cut, and the box its reading goes in. */
export const TRIAL_CUT_STEP = "Trial cut: cut shallow, unplug, measure its diameter; go to full depth only if it reads as planned.";
export const TRIAL_CUT_READING = "Trial cut diameter reading";

/** The study page shows every caution once, beside the plan. */
export const STUDY_CAUTIONS: readonly string[] = SETUP_CARD_CAUTIONS;

/** The customer sees only what the customer decides on: the legal class and the kit maker's instructions. */
export const CONSULT_CAUTIONS = {
  legalClass: "A change of displacement can change the vehicle's legal class (for example its licence, registration or insurance class); local rules decide — check them before approving.",
  kitMaker: "Cutting a crankcase cannot be undone. The shop follows the kit maker's instructions and defers to qualified machinists where in doubt.",
} as const;

/** The line under every list of cautions. */
export const DEFER = "These figures plan the work; local regulations, the kit maker's instructions and a qualified machinist come first.";
