/** The views of the app, in tab order, with their labels (our own names). */
export const VIEWS = [
  { id: 'airframe', label: 'Airframe & polar' },
  { id: 'engine', label: 'Engine deck' },
  { id: 'inlets', label: 'Inlets' },
  { id: 'mission', label: 'Mission' },
  { id: 'cautions', label: 'Caution limits' },
  { id: 'results', label: 'Flight results' },
  { id: 'crossover', label: 'Thrust vs drag' },
  { id: 'envelope', label: 'Flight envelope' },
  { id: 'specificRange', label: 'Specific range' },
  { id: 'compare', label: 'Inlet A/B' },
  { id: 'sweep', label: 'Parameter study' },
] as const;

export type ViewId = (typeof VIEWS)[number]['id'];
