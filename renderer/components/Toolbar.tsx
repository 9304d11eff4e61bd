import type { UnitSystem } from '../../engine/units';

export interface ToolbarProps {
  readonly units: UnitSystem;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  readonly undoLabel: string | null;
  readonly hasResult: boolean;
  readonly onCommand: (command: ToolbarCommand) => void;
  readonly onUnits: (units: UnitSystem) => void;
}

export type ToolbarCommand = 'open' | 'openDemo' | 'save' | 'saveAs' | 'importDeck' | 'exportHistory' | 'exportLegs' | 'print' | 'undo' | 'redo';

const BUTTONS: readonly { readonly command: ToolbarCommand; readonly label: string; readonly needsResult?: boolean }[] = [
  { command: 'open', label: 'Open…' },
  { command: 'openDemo', label: 'Demo study' },
  { command: 'save', label: 'Save' },
  { command: 'saveAs', label: 'Save as…' },
  { command: 'importDeck', label: 'Import deck…' },
  { command: 'exportHistory', label: 'Time history CSV', needsResult: true },
  { command: 'exportLegs', label: 'Legs CSV', needsResult: true },
  { command: 'print', label: 'Printable report', needsResult: true },
];

/** File commands, undo/redo and the unit system. */
export function Toolbar(props: ToolbarProps) {
  return (
    <div className="toolbar" role="toolbar">
      {BUTTONS.map((b) => (
        <button key={b.command} type="button" data-testid={`command-${b.command}`} disabled={b.needsResult === true && !props.hasResult} onClick={() => props.onCommand(b.command)}>
          {b.label}
        </button>
      ))}
      <button type="button" data-testid="command-undo" disabled={!props.canUndo} title={props.undoLabel ? `Undo: ${props.undoLabel}` : 'Nothing to undo'} onClick={() => props.onCommand('undo')}>
        Undo
      </button>
      <button type="button" data-testid="command-redo" disabled={!props.canRedo} onClick={() => props.onCommand('redo')}>
        Redo
      </button>
      <label className="unit-choice">
        Units{' '}
        <select data-testid="unit-system-toggle" value={props.units} onChange={(e) => props.onUnits(e.target.value as UnitSystem)}>
          <option value="si">SI</option>
          <option value="customary">Customary (ft, kt, lb)</option>
        </select>
      </label>
    </div>
  );
}
