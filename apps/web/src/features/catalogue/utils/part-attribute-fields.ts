import {
  fluidSchema,
  hoseClassInfo,
  hoseClassSchema,
  hoseEndTypeLabels,
  hoseEndTypeSchema,
  hoseLinerSchema,
  sealCompoundLabels,
  sealCompoundSchema,
  type PartKind,
} from '@linesmith/catalog';
import { fluidLabels, linerLabels } from './part-kind-labels';

/**
 * The editor's fields per part kind. `key` is the attribute's path (dotted); connection and
 * seal fields expand to `key.family`/`key.size`/`key.gender`/`key.seat` and `key.type`/`key.value`.
 * The catalogue library's `partAttributeSchemas` stays the judge of what is valid.
 */
export type AttributeField =
  | { type: 'number'; key: string; label: string; unit?: string; optional?: boolean }
  | { type: 'text'; key: string; label: string; hint: string }
  | { type: 'text-list'; key: string; label: string; hint: string }
  | { type: 'choice'; key: string; label: string; options: readonly { value: string; label: string }[]; optional?: boolean }
  | { type: 'multi-choice'; key: string; label: string; options: readonly { value: string; label: string }[]; optional?: boolean }
  | { type: 'angle'; key: string; label: string }
  | { type: 'connection'; key: string; label: string }
  | { type: 'seal'; key: string; label: string };

const liners = hoseLinerSchema.options.map((value) => ({ value, label: linerLabels[value] }));
const fluids = fluidSchema.options.map((value) => ({ value, label: fluidLabels[value] }));
const hoseClasses = hoseClassSchema.options.map((value) => ({ value, label: hoseClassInfo[value].label }));
const endTypes = hoseEndTypeSchema.options.map((value) => ({ value, label: hoseEndTypeLabels[value] }));
const compounds = sealCompoundSchema.options.map((value) => ({ value, label: sealCompoundLabels[value].charAt(0).toUpperCase() + sealCompoundLabels[value].slice(1) }));
const fittedSealCompound: AttributeField = { type: 'choice', key: 'sealCompound', label: 'Compound of the fitted seal', options: compounds, optional: true };

const odRange: AttributeField[] = [
  { type: 'number', key: 'fitsOd.minIn', label: 'Fits hose OD from', unit: 'in' },
  { type: 'number', key: 'fitsOd.maxIn', label: 'Fits hose OD up to', unit: 'in' },
];

export const attributeFields: Record<PartKind, AttributeField[]> = {
  hose: [
    { type: 'number', key: 'dash', label: 'Dash size' },
    { type: 'text', key: 'hoseType', label: 'Hose type', hint: 'The family of hose ends it takes, e.g. braided-rubber.' },
    { type: 'choice', key: 'hoseClass', label: 'Standard class', options: hoseClasses, optional: true },
    { type: 'multi-choice', key: 'endTypes', label: 'Hose ends made for it', options: endTypes, optional: true },
    { type: 'number', key: 'idIn', label: 'Inside diameter', unit: 'in' },
    { type: 'number', key: 'odIn', label: 'Outside diameter', unit: 'in' },
    { type: 'choice', key: 'liner', label: 'Liner', options: liners },
    { type: 'number', key: 'maxPressurePsi', label: 'Max working pressure', unit: 'psi' },
    { type: 'number', key: 'maxTempF', label: 'Max temperature', unit: '°F' },
    { type: 'number', key: 'minBendRadiusIn', label: 'Min bend radius', unit: 'in' },
    {
      type: 'choice',
      key: 'minBendRadiusMeasuredTo',
      label: 'Min bend radius quoted to',
      options: [
        { value: 'inside', label: 'Inside of the bend (hose makers’ usual way)' },
        { value: 'centreline', label: 'Centreline of the hose' },
      ],
    },
    { type: 'multi-choice', key: 'fluids', label: 'Fluids it is rated for', options: fluids },
  ],
  'hose-end': [
    { type: 'number', key: 'hoseDash', label: 'Hose dash size' },
    { type: 'text-list', key: 'hoseTypes', label: 'Hose types it fits', hint: 'Comma-separated, e.g. braided-rubber, cooler-hose.' },
    { type: 'choice', key: 'endType', label: 'How it holds the hose', options: endTypes, optional: true },
    { type: 'connection', key: 'port', label: 'Port-side connection' },
    { type: 'angle', key: 'angle', label: 'Angle' },
    { type: 'number', key: 'allowanceIn', label: 'End allowance (seal point to hose cut face)', unit: 'in' },
    { type: 'number', key: 'rigidLengthIn', label: 'Rigid length (seal point to where the hose leaves the socket)', unit: 'in', optional: true },
    { type: 'number', key: 'reachIn', label: 'Reach into a port (male port side)', unit: 'in', optional: true },
    { type: 'number', key: 'boreIn', label: 'Smallest bore', unit: 'in' },
    { type: 'number', key: 'maxPressurePsi', label: 'Rated pressure', unit: 'psi' },
  ],
  adapter: [
    { type: 'connection', key: 'a', label: 'Connection A' },
    { type: 'connection', key: 'b', label: 'Connection B' },
    { type: 'angle', key: 'angle', label: 'Angle' },
    { type: 'number', key: 'bodyLengthIn', label: 'Body length', unit: 'in' },
    { type: 'number', key: 'reachIn', label: 'Reach into the port (side A)', unit: 'in', optional: true },
    { type: 'number', key: 'boreIn', label: 'Smallest bore', unit: 'in' },
    { type: 'text-list', key: 'features', label: 'Features', hint: 'Comma-separated, e.g. long-nose.' },
    { type: 'seal', key: 'seal', label: 'Seal needed' },
    fittedSealCompound,
    { type: 'number', key: 'maxPressurePsi', label: 'Rated pressure', unit: 'psi', optional: true },
  ],
  plug: [
    { type: 'connection', key: 'connection', label: 'Connection' },
    { type: 'number', key: 'reachIn', label: 'Reach into the port', unit: 'in', optional: true },
    { type: 'seal', key: 'seal', label: 'Seal needed' },
    fittedSealCompound,
    { type: 'number', key: 'maxPressurePsi', label: 'Rated pressure', unit: 'psi', optional: true },
  ],
  clamp: odRange,
  sleeve: [...odRange, { type: 'number', key: 'maxTempF', label: 'Temperature rating', unit: '°F' }],
  seal: [
    { type: 'seal', key: 'seal', label: 'Seal' },
    { type: 'choice', key: 'compound', label: 'Compound', options: compounds, optional: true },
    { type: 'number', key: 'hardnessShoreA', label: 'Hardness', unit: 'Shore A', optional: true },
  ],
  bulkhead: [
    { type: 'connection', key: 'a', label: 'Connection A' },
    { type: 'connection', key: 'b', label: 'Connection B' },
    { type: 'number', key: 'bodyLengthIn', label: 'Body length', unit: 'in' },
    { type: 'number', key: 'boreIn', label: 'Smallest bore', unit: 'in' },
    { type: 'number', key: 'maxPressurePsi', label: 'Rated pressure', unit: 'psi', optional: true },
  ],
};
