import { bendNearSocketRule } from './bend-near-socket.rule.js';
import { bendRadiusRule } from './bend-radius.rule.js';
import { freeHoseLengthRule } from './free-hose-length.rule.js';
import { measuredLengthRule } from './measured-length.rule.js';
import { flowDirectionRule } from './flow-direction.rule.js';
import { fluidRule } from './fluid.rule.js';
import { heatContactRule } from './heat-contact.rule.js';
import { heatSleeveRule } from './heat-sleeve.rule.js';
import { hoseEndSizeRule } from './hose-end-size.rule.js';
import { incompleteLineRule } from './incomplete-line.rule.js';
import { jointCautionRule } from './joint-caution.rule.js';
import { jointGenderRule } from './joint-gender.rule.js';
import { jointSeatRule } from './joint-seat.rule.js';
import { jointThreadRule } from './joint-thread.rule.js';
import { lubePathValveRule } from './lube-path-valve.rule.js';
import { missingPartRule } from './missing-part.rule.js';
import { noSlackRule } from './no-slack.rule.js';
import { openPortRule } from './open-port.rule.js';
import { portReachRule } from './port-reach.rule.js';
import { portRequirementRule } from './port-requirement.rule.js';
import { ratingPressureRule } from './rating-pressure.rule.js';
import { ratingTemperatureRule } from './rating-temperature.rule.js';
import { restrictionRule } from './restriction.rule.js';
import type { Rule } from './rule.js';
import { scaleMissingRule } from './scale-missing.rule.js';
import { supportGapRule } from './support-gap.rule.js';

/** Every rule the engine runs, in the order of DOMAIN §5 (plus missing-part), the hose-behaviour checks beside bend-radius. */
export const ruleRegistry: readonly Rule[] = [
  jointSeatRule,
  jointThreadRule,
  jointGenderRule,
  jointCautionRule,
  portRequirementRule,
  portReachRule,
  hoseEndSizeRule,
  ratingPressureRule,
  ratingTemperatureRule,
  fluidRule,
  bendRadiusRule,
  bendNearSocketRule,
  freeHoseLengthRule,
  measuredLengthRule,
  heatContactRule,
  heatSleeveRule,
  supportGapRule,
  restrictionRule,
  lubePathValveRule,
  openPortRule,
  flowDirectionRule,
  noSlackRule,
  scaleMissingRule,
  incompleteLineRule,
  missingPartRule,
];
