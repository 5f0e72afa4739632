// Quantum teleportation in its deferred-measurement form (Nielsen & Chuang, §1.3.7 and §4.4):
// the classically controlled X and Z corrections become controlled gates, and measurement comes last.
OPENQASM 3.0;
include "stdgates.inc";

qubit[3] q;   // q[0]: state to send, q[1]: Alice's half, q[2]: Bob's half
bit[3] c;

// The input state |ψ> = U(θ, φ, λ)|0> on q[0].
U(1.1, 0.7, -0.4) q[0];

// Share a Bell pair between Alice (q[1]) and Bob (q[2]).
h q[1];
cx q[1], q[2];

// Alice's Bell-basis rotation.
cx q[0], q[1];
h q[0];

// Bob's corrections, controlled by Alice's qubits instead of her measurement results.
cx q[1], q[2];
cz q[0], q[2];

c = measure q;
