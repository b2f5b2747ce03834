// Component tests (Testing Library in happy-dom): unmount what each test rendered and forget its storage.
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

afterEach(() => {
  cleanup();
  sessionStorage.clear();
});
