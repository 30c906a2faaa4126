import { Tab, TabList, Text, makeStyles, tokens } from '@fluentui/react-components';
import { useSearchParams } from 'react-router-dom';
import { SafetyNote } from '../../shell/components/SafetyNote';
import { JointCheckerSection } from './JointCheckerSection';
import { RulesSection } from './RulesSection';
import { ThreadIdentifierSection } from './ThreadIdentifierSection';
import { ThreadTablesSection } from './ThreadTablesSection';

const tabs = [
  { value: 'threads', label: 'Thread tables', Panel: ThreadTablesSection },
  { value: 'identify', label: 'Thread identifier', Panel: ThreadIdentifierSection },
  { value: 'joints', label: 'Joint checker', Panel: JointCheckerSection },
  { value: 'rules', label: 'Rules', Panel: RulesSection },
] as const;

type TabValue = (typeof tabs)[number]['value'];

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  panel: { paddingTop: tokens.spacingVerticalS, paddingBottom: tokens.spacingVerticalL },
});

/** Reference: thread tables, thread identifier, joint checker and the rules behind the flags. */
export function ReferencePage() {
  const styles = useStyles();
  // The open tab lives in the address (`?tab=identify`), so it can be bookmarked and shared.
  const [params, setParams] = useSearchParams();
  const current = tabs.find((tab) => tab.value === params.get('tab')) ?? tabs[0];

  function select(value: TabValue) {
    setParams(value === tabs[0].value ? {} : { tab: value }, { replace: true });
  }

  return (
    <section className={styles.page} aria-labelledby="reference-title">
      <Text as="h1" id="reference-title" size={700} weight="semibold">
        Reference
      </Text>
      <TabList selectedValue={current.value} onTabSelect={(_, data) => select(data.value as TabValue)}>
        {tabs.map((tab) => (
          <Tab key={tab.value} value={tab.value} id={`reference-tab-${tab.value}`}>
            {tab.label}
          </Tab>
        ))}
      </TabList>
      <div role="tabpanel" aria-labelledby={`reference-tab-${current.value}`} className={styles.panel}>
        <current.Panel />
      </div>
      <SafetyNote />
    </section>
  );
}
