import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, tokens } from '@fluentui/react-components';
import { otherShortcuts, tools } from '../model/tools';

const useStyles = makeStyles({
  table: { borderCollapse: 'collapse', width: '100%' },
  cell: { padding: '2px 6px', borderBottom: `1px solid ${tokens.colorNeutralStroke2}`, textAlign: 'left', verticalAlign: 'top' },
});

export interface HelpDialogProps {
  open: boolean;
  onClose(): void;
}

/** Every tool and key of the sketch editor (opened with ?). */
export function HelpDialog({ open, onClose }: HelpDialogProps) {
  const styles = useStyles();
  return (
    <Dialog open={open} onOpenChange={(_, d) => !d.open && onClose()}>
      <DialogSurface aria-label="Sketch keys">
        <DialogBody>
          <DialogTitle>Sketch keys</DialogTitle>
          <DialogContent>
            <table className={styles.table}>
              <tbody>
                {tools.map((t) => (
                  <tr key={t.id}>
                    <th scope="row" className={styles.cell}>
                      <kbd>{t.key}</kbd>
                    </th>
                    <td className={styles.cell}>
                      <strong>{t.label}</strong>: {t.hint}
                    </td>
                  </tr>
                ))}
                {otherShortcuts.map((s) => (
                  <tr key={s.keys}>
                    <th scope="row" className={styles.cell}>
                      <kbd>{s.keys}</kbd>
                    </th>
                    <td className={styles.cell}>{s.action}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </DialogContent>
          <DialogActions>
            <Button appearance="primary" onClick={onClose}>
              Close
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
