// Component tests (Testing Library in happy-dom): unmount what each test rendered and forget its storage.
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';

// findBy… waits up to 10 s, not 1 s: a busy CI machine renders slowly (a budget, not an assertion).
configure({ asyncUtilTimeout: 10_000 });

afterEach(() => {
  cleanup();
  sessionStorage.clear();
});
