import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner } from '@fluentui/react-components';
import type { Part } from '@linesmith/catalog';
import { defaultShopRules, type CircuitDocument, type ShopRules } from '@linesmith/routing';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useApiClient } from '../../../lib/useApiClient';
import { useSession } from '../../auth/hooks/useSession';
import { uploadsQueryOptions } from '../../builds/api/uploads-query-options';
import { circuitKeys } from '../../circuits/api/circuit-keys';
import type { Circuit } from '../../circuits/api/circuit-schema';
import type { CircuitDraft } from '../../circuits/api/draft-schema';
import { useCircuitDraft } from '../../circuits/hooks/useCircuitDraft';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import { catalogueQueryOptions } from '../api/catalogue-query-options';
import { createRevision } from '../api/create-revision';
import { saveDraft } from '../api/save-draft';
import { shopRulesQueryOptions } from '../api/shop-rules-query-options';
import { useDraftAutosave, type DraftSaver } from '../hooks/useDraftAutosave';
import { createEditorStore } from '../model/editor-store';
import { SaveControls } from './SaveControls';
import { SketchEditor } from './SketchEditor';

export interface SketchTabProps {
  circuit: Circuit;
}

function LoadError({ what, error, retry }: { what: string; error: Error; retry(): void }) {
  return (
    <MessageBar intent="error" role="alert">
      <MessageBarBody>
        {what} could not be loaded: {error.message}
      </MessageBarBody>
      <MessageBarActions>
        <Button onClick={retry}>Try again</Button>
      </MessageBarActions>
    </MessageBar>
  );
}

/** The Sketch tab of a circuit (its own chunk, with Konva): loads the draft and catalogue, then the editor. */
export function SketchTab({ circuit }: SketchTabProps) {
  const client = useApiClient();
  const draft = useCircuitDraft(circuit.id);
  const catalogue = useQuery(catalogueQueryOptions(client));
  const rules = useQuery(shopRulesQueryOptions(client));
  if (draft.isPending || catalogue.isPending || rules.isPending) return <Spinner label="Loading the sketch…" />;
  if (draft.isError) return <LoadError what="The sketch" error={draft.error} retry={() => void draft.refetch()} />;
  if (catalogue.isError) return <LoadError what="The parts catalogue" error={catalogue.error} retry={() => void catalogue.refetch()} />;
  return (
    <>
      {rules.isError && (
        <MessageBar intent="warning">
          <MessageBarBody>The shop rules could not be loaded, so the sketch is checked against the default rules.</MessageBarBody>
        </MessageBar>
      )}
      <SketchWorkspace circuit={circuit} draft={draft.data} parts={catalogue.data} shopRules={rules.data ?? defaultShopRules} />
    </>
  );
}

interface SketchWorkspaceProps {
  circuit: Circuit;
  draft: CircuitDraft;
  parts: readonly Part[];
  shopRules: ShopRules;
}

/** One editing session over the loaded draft: the store lives as long as the tab stays open. */
function SketchWorkspace({ circuit, draft, parts, shopRules }: SketchWorkspaceProps) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const { me } = useSession();
  const { units } = useUnitPreferences();
  const [store] = useState(() => createEditorStore(draft.document));
  const uploads = useQuery(uploadsQueryOptions(client, circuit.buildId));
  const photos = useMemo(() => (uploads.data ?? []).filter((u) => u.kind === 'photo'), [uploads.data]);
  const canEdit = !!me?.roles.some((r) => r === 'fabricator' || r === 'admin');

  const saver = useMemo<DraftSaver>(
    () => ({
      save: (version, document) => saveDraft(client, circuit.id, version, document),
      snapshotServerDraft: (message) => createRevision(client, circuit.id, message),
      onSaved: (document: CircuitDocument, draftVersion: number) => {
        queryClient.setQueryData(circuitKeys.draft(circuit.id), { document, draftVersion });
        void queryClient.invalidateQueries({ queryKey: circuitKeys.check(circuit.id) });
      },
    }),
    [client, queryClient, circuit.id],
  );
  const autosave = useDraftAutosave(store, draft.draftVersion, saver);

  const saveVersion = async (message: string) => {
    const revision = await createRevision(client, circuit.id, message);
    void queryClient.invalidateQueries({ queryKey: circuitKeys.revisions(circuit.id) });
    return revision.number;
  };

  return (
    <SketchEditor
      store={store}
      parts={parts}
      shopRules={shopRules}
      lengthUnit={units.length}
      photos={photos}
      exportName={circuit.name.replace(/[^\w-]+/g, '-').toLowerCase() || 'circuit-sketch'}
      saveSlot={<SaveControls autosave={autosave} onSaveVersion={saveVersion} canEdit={canEdit} />}
    />
  );
}
