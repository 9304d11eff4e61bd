import { QuantityField } from '../components/QuantityField';
import { CAUTION_LIMITS, fixedCautions } from '../state/cautionLimits';
import { formatField } from '../state/fieldUnits';
import { useStudy } from '../state/studyContext';

/** Every caution limit: its value (blank = the default), the default and its source; then the cautions whose limits are inputs elsewhere. */
export function CautionsView() {
  const { state, dispatch } = useStudy();
  const cautions = state.doc!.present.cautions;
  return (
    <section>
      <h2>Caution limits</h2>
      <table className="caution-limits">
        <thead>
          <tr>
            <th>Limit</th>
            <th>Value (blank: default)</th>
            <th>Default</th>
            <th>Source of the default</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {CAUTION_LIMITS.map((l) => (
            <tr key={l.key} data-testid={`caution-limit-${l.key}`}>
              <td>{l.label}</td>
              <td>
                <QuantityField label={l.label} path={['cautions', l.key]} unit={l.unit} testId={`field-caution-${l.key}`} optional hideLabel />
              </td>
              <td>{formatField(l.default_si, l.unit, state.units)}</td>
              <td className="small">{l.source}</td>
              <td>
                <button
                  type="button"
                  data-testid={`caution-limit-${l.key}-reset`}
                  disabled={cautions[l.key] === undefined}
                  onClick={() => dispatch({ type: 'valueSet', path: ['cautions', l.key], value: undefined, label: `Reset ${l.label}` })}
                >
                  Use default
                </button>
              </td>
            </tr>
          ))}
          <tr data-testid="caution-limit-cautionOnDeckExtrapolation">
            <td>Caution on deck lookups outside the table</td>
            <td>
              <input
                type="checkbox"
                data-testid="field-caution-cautionOnDeckExtrapolation"
                aria-label="Caution on deck lookups outside the table"
                checked={cautions.cautionOnDeckExtrapolation ?? true}
                onChange={(e) => dispatch({ type: 'valueSet', path: ['cautions', 'cautionOnDeckExtrapolation'], value: e.target.checked, label: 'Deck extrapolation caution' })}
              />
            </td>
            <td>on</td>
            <td className="small">Passed through from the propulsion model, first time per leg</td>
            <td />
          </tr>
        </tbody>
      </table>
      <h3>Cautions checked against other inputs</h3>
      <table className="caution-fixed" data-testid="caution-fixed">
        <tbody>
          {fixedCautions().map((c) => (
            <tr key={c.id}>
              <td>{c.title}</td>
              <td>{c.severity}</td>
              <td className="small">{c.source}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
