import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// Routes are lazily loaded; on a busy two-core CI machine the first chunk can take longer than
// Testing Library's default 1 s to arrive. Waiting longer changes no assertion.
configure({ asyncUtilTimeout: 8000 });

afterEach(() => {
  cleanup();
  window.localStorage.clear();
  delete document.documentElement.dataset.theme;
});
