import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';
import './setup-loud';

afterEach(() => cleanup());

// findBy* and waitFor give up after 1 s by default; a shared 2-core machine under load renders a
// page with the real engine slower than that. A longer wait changes no assertion.
configure({ asyncUtilTimeout: 15000 });
