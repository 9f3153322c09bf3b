import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './index.css';
import { AppProvider } from './app/provider';

// A MediaQueryList is live (its `matches` and change events follow the system), so one per query is
// enough; the chart library asks for the reduced-motion query on every redraw, and each fresh
// query costs a style pass.
const queries = new Map<string, MediaQueryList>();
const matchMediaOnce = window.matchMedia?.bind(window);
if (matchMediaOnce) {
  window.matchMedia = (query: string) => {
    let list = queries.get(query);
    if (!list) {
      list = matchMediaOnce(query);
      queries.set(query, list);
    }
    return list;
  };
}

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
createRoot(root).render(
  <StrictMode>
    <AppProvider />
  </StrictMode>,
);
