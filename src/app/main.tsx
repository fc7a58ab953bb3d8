import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './App';
import { KeepWorkBoundary } from './KeepWorkBoundary';
import './styles.css';

const root = document.getElementById('root');
if (!root) throw new Error('Foldroot: the page has no #root element.');
createRoot(root).render(
  <StrictMode>
    <KeepWorkBoundary part="The page">
      <App />
    </KeepWorkBoundary>
  </StrictMode>,
);
