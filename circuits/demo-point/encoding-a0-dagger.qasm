OPENQASM 3.0;
include "stdgates.inc";

// creation_0_compute: compute part of creation_0
gate creation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// creation_0_action: action part of creation_0
gate creation_0_action q0, q1, q2, q3, q4 {
  cz q4, q0;
  x q0;
}

// creation_0: Jordan–Wigner a†_0
gate creation_0 q0, q1, q2, q3, q4 {
  creation_0_compute q0, q1, q2, q3, q4;
  creation_0_action q0, q1, q2, q3, q4;
  inv @ creation_0_compute q0, q1, q2, q3, q4;
}

qubit[4] system;
qubit[1] ladder;

creation_0 system[0], system[1], system[2], system[3], ladder[0];
