import { BridgeError, type DemoFiles } from './bridge';

// The demo project and deck are bundled by Vite as raw text. A glob (not a
// plain import) so the app still builds, and says so, if they are missing.
const projectFiles = import.meta.glob<string>('../../fixtures/demo/*.blockwise.json', { query: '?raw', import: 'default' });
const deckFiles = import.meta.glob<string>('../../fixtures/demo/*.deck.csv', { query: '?raw', import: 'default' });

function baseName(path: string): string {
  return path.slice(path.lastIndexOf('/') + 1);
}

/** Loads the bundled demo project and deck (fixtures/demo/). */
export async function loadDemoFiles(): Promise<DemoFiles> {
  const projectPath = Object.keys(projectFiles).sort()[0];
  const deckPath = Object.keys(deckFiles).sort()[0];
  const loadProject = projectPath === undefined ? undefined : projectFiles[projectPath];
  const loadDeck = deckPath === undefined ? undefined : deckFiles[deckPath];
  if (projectPath === undefined || deckPath === undefined || loadProject === undefined || loadDeck === undefined) {
    throw new BridgeError('demo_missing', 'The demo project is not bundled: fixtures/demo/ needs a *.blockwise.json and a *.deck.csv file.');
  }
  const [projectText, deckText] = await Promise.all([loadProject(), loadDeck()]);
  return { projectName: baseName(projectPath), projectText, deckName: baseName(deckPath), deckText };
}
