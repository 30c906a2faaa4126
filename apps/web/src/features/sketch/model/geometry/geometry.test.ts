import { defaultShopRules, demoParts as _unused, evaluateCircuit, formatLength } from '@linesmith/routing';
