import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/public-sans/400.css';
import '@fontsource/public-sans/600.css';
import '@fontsource/public-sans/700.css';
import './index.css';
import { App } from './app';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element to start Ferrule in');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
