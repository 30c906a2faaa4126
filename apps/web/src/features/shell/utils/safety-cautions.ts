/** The usual cautions for work on pressurised, hot or flammable fluid lines (PRODUCT.md, Safety). */
export const safetyCautions: readonly string[] = [
  'Relieve the pressure and let the system cool before opening any line or fitting.',
  'Never route fuel or oil lines near an exhaust, turbo or other hot part without shielding.',
  'Use hose, hose ends and adapters rated for the fluid, the maximum pressure and the maximum temperature.',
  'Check every joint with a leak test at working pressure before the vehicle is driven.',
];

export const safetyPrecedence =
  "Local codes, sanctioning-body rules and the component makers' instructions take precedence over Linesmith's checks.";

export const brakeLineWarning =
  'Brake lines are outside what Linesmith plans: they fall under vehicle-safety standards and licensed practice.';
