import { command } from './command';

export const deleteHeatZone = command<{ zoneId: string }>('Delete heat zone', (draft, { zoneId }) => {
  draft.heatZones = draft.heatZones.filter((z) => z.id !== zoneId);
});
