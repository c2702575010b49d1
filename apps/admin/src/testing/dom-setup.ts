import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// Without vitest's globals Testing Library cannot unmount by itself, and one test's screen would leak into the next.
afterEach(cleanup);
