OPENQASM 3.0;
include "stdgates.inc";

// rotate: two-axis rotation
gate rotate(theta, phi) q0 {
  rz(theta * 2 + (-0.5)) q0;
  ry(-theta) q0;
  rx(phi ** (-theta)) q0;
  p(phi - (theta - sin(phi))) q0;
}

// entangle: rotate both, then entangle
gate entangle(a) q0, q1 {
  rotate(a, 0.5) q0;
  rotate(a / 3, 1.5) q1;
  cz q0, q1;
}

// rotate_2: a different block with the same name
gate rotate_2 q0 {
  h q0;
}

qubit[2] q;

entangle(0.75) q[0], q[1];
inv @ pow(2) @ rotate(-0.1, 2) q[1];
ctrl @ rotate_2 q[1], q[0];
