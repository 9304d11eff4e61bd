import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './App';
import { createBridge } from './bridge/createBridge';
import { createWorkerClient } from './worker/engineClient';
import './styles.css';
import './print.css';

const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('index.html has no #root element');
createRoot(rootElement).render(
  <StrictMode>
    <App bridge={createBridge()} engine={createWorkerClient()} />
  </StrictMode>,
);
