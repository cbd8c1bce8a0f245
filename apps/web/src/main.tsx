import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import '@fontsource/merriweather/400.css';
import '@fontsource/merriweather/700.css';
import '@fontsource/source-code-pro/400.css';
// GD&T symbols (⌖ ⌀ Ⓜ Ⓛ ⏥ ⟂ …): downloaded only when a page shows one, thanks to unicode-range.
import './app/symbol-fonts.css';
import '@fontsource/source-code-pro/500.css';
import './app/mantine-styles';
import './app/global.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
