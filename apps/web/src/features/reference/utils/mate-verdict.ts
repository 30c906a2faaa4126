import type { MateCode } from '@linesmith/catalog';
import type { SeverityLevel } from '../components/SeverityLabel';

/** How the joint checker words each mating outcome; every failed joint is a blocker (DOMAIN §5). */
export const mateVerdicts: Readonly<Record<MateCode, { level: SeverityLevel; text: string }>> = {
  ok: { level: 'ok', text: 'Joins' },
  'joint-thread': { level: 'blocker', text: 'Blocker: the threads differ' },
  'joint-seat': { level: 'blocker', text: 'Blocker: the seats differ' },
  'joint-gender': { level: 'blocker', text: 'Blocker: both ends are the same gender' },
};
