// Runs the user-facing example examples/verify-my-encoding.test.ts as part of the suite, so the copyable example keeps working.
import '../../examples/verify-my-encoding.test.js';
