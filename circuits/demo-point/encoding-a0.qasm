OPENQASM 3.0;
include "stdgates.inc";

// annihilation_0_compute: compute part of annihilation_0
gate annihilation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// annihilation_0_action: action part of annihilation_0
gate annihilation_0_action q0, q1, q2, q3, q4 {
  x q0;
  cz q4, q0;
}

// annihilation_0: Jordan–Wigner a_0
gate annihilation_0 q0, q1, q2, q3, q4 {
  annihilation_0_compute q0, q1, q2, q3, q4;
  annihilation_0_action q0, q1, q2, q3, q4;
  inv @ annihilation_0_compute q0, q1, q2, q3, q4;
}

qubit[4] system;
qubit[1] ladder;

annihilation_0 system[0], system[1], system[2], system[3], ladder[0];
