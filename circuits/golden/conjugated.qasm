OPENQASM 3.0;
include "stdgates.inc";

// phase_kick_compute: compute part of phase_kick
gate phase_kick_compute(theta) q0, q1 {
  h q0;
  cx q0, q1;
}

// phase_kick_action: action part of phase_kick
gate phase_kick_action(theta) q0, q1 {
  rz(theta) q1;
}

// phase_kick: basis change, phase, basis change back
gate phase_kick(theta) q0, q1 {
  phase_kick_compute(theta) q0, q1;
  phase_kick_action(theta) q0, q1;
  inv @ phase_kick_compute(theta) q0, q1;
}

// wrapper_c1n0: a kick between two T gates (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate wrapper_c1n0 c0, q0, q1 {
  ctrl @ t c0, q0;
  phase_kick_compute(0.3) q0, q1;
  ctrl @ phase_kick_action(0.3) c0, q0, q1;
  inv @ phase_kick_compute(0.3) q0, q1;
  ctrl @ t c0, q1;
}

qubit[1] anc;
qubit[2] sys;

phase_kick(0.5) sys[0], sys[1];
inv @ phase_kick(0.5) sys[0], sys[1];
phase_kick_compute(0.5) sys[0], sys[1];
ctrl @ phase_kick_action(0.5) anc[0], sys[0], sys[1];
inv @ phase_kick_compute(0.5) sys[0], sys[1];
phase_kick_compute(-0.25) sys[1], sys[0];
negctrl @ pow(3) @ phase_kick_action(-0.25) anc[0], sys[1], sys[0];
inv @ phase_kick_compute(-0.25) sys[1], sys[0];
inv @ wrapper_c1n0 anc[0], sys[0], sys[1];
