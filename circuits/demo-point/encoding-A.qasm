OPENQASM 3.0;
include "stdgates.inc";

// lcu_prepare: PREPARE of A (one-body)
gate lcu_prepare q0, q1, q2, q3 {
  ry(0.47588224966041653) q3;
  ry(0.6966983611772631) q2;
  cx q3, q2;
  ry(0.6966983611772631) q2;
  cx q3, q2;
  ry(0.6466820596542351) q1;
  cx q2, q1;
  ry(-0.06704231929053067) q1;
  cx q3, q1;
  ry(-0.06704231929053067) q1;
  cx q2, q1;
  ry(0.6466820596542351) q1;
  cx q3, q1;
  ry(0.8329295642340651) q0;
  cx q1, q0;
  ry(0.04753140083661675) q0;
  cx q2, q0;
  ry(-0.08336829306295801) q0;
  cx q1, q0;
  ry(-0.08336829306295801) q0;
  cx q3, q0;
  ry(-0.08336829306295801) q0;
  cx q1, q0;
  ry(-0.08336829306295801) q0;
  cx q2, q0;
  ry(0.04753140083661675) q0;
  cx q1, q0;
  ry(0.8329295642340651) q0;
  cx q3, q0;
}

// lcu_compute: compute part of lcu
gate lcu_compute q0, q1, q2, q3, q4, q5, q6, q7 {
  lcu_prepare q4, q5, q6, q7;
}

// pauli_string: Pauli string I
gate pauli_string q0, q1, q2, q3 {
}

// pauli_string_2: Pauli string Z0
gate pauli_string_2 q0, q1, q2, q3 {
  z q0;
}

// pauli_string_3: Pauli string Y0 Y1
gate pauli_string_3 q0, q1, q2, q3 {
  y q0;
  y q1;
}

// pauli_string_4: Pauli string X0 X1
gate pauli_string_4 q0, q1, q2, q3 {
  x q0;
  x q1;
}

// pauli_string_5: Pauli string Z1
gate pauli_string_5 q0, q1, q2, q3 {
  z q1;
}

// pauli_string_6: Pauli string Z2
gate pauli_string_6 q0, q1, q2, q3 {
  z q2;
}

// pauli_string_7: Pauli string Y2 Y3
gate pauli_string_7 q0, q1, q2, q3 {
  y q2;
  y q3;
}

// pauli_string_8: Pauli string X2 X3
gate pauli_string_8 q0, q1, q2, q3 {
  x q2;
  x q3;
}

// pauli_string_9: Pauli string Z3
gate pauli_string_9 q0, q1, q2, q3 {
  z q3;
}

// lcu_action: action part of lcu
gate lcu_action q0, q1, q2, q3, q4, q5, q6, q7 {
  negctrl(4) @ pauli_string q4, q5, q6, q7, q0, q1, q2, q3;
  negctrl(4) @ gphase(3.141592653589793) q4, q5, q6, q7;
  ctrl @ negctrl(3) @ pauli_string_2 q4, q5, q6, q7, q0, q1, q2, q3;
  ctrl @ negctrl(3) @ pauli_string_3 q5, q4, q6, q7, q0, q1, q2, q3;
  ctrl @ negctrl(3) @ gphase(3.141592653589793) q5, q4, q6, q7;
  ctrl(2) @ negctrl(2) @ pauli_string_4 q4, q5, q6, q7, q0, q1, q2, q3;
  ctrl(2) @ negctrl(2) @ gphase(3.141592653589793) q4, q5, q6, q7;
  ctrl @ negctrl(3) @ pauli_string_5 q6, q4, q5, q7, q0, q1, q2, q3;
  ctrl @ negctrl(3) @ gphase(3.141592653589793) q6, q4, q5, q7;
  ctrl(2) @ negctrl(2) @ pauli_string_6 q4, q6, q5, q7, q0, q1, q2, q3;
  ctrl(2) @ negctrl(2) @ pauli_string_7 q5, q6, q4, q7, q0, q1, q2, q3;
  ctrl(2) @ negctrl(2) @ gphase(3.141592653589793) q5, q6, q4, q7;
  ctrl(3) @ negctrl @ pauli_string_8 q4, q5, q6, q7, q0, q1, q2, q3;
  ctrl(3) @ negctrl @ gphase(3.141592653589793) q4, q5, q6, q7;
  ctrl @ negctrl(3) @ pauli_string_9 q7, q4, q5, q6, q0, q1, q2, q3;
  ctrl @ negctrl(3) @ gphase(3.141592653589793) q7, q4, q5, q6;
}

// lcu: block-encoding of A (one-body) by PREPARE/SELECT
gate lcu q0, q1, q2, q3, q4, q5, q6, q7 {
  lcu_compute q0, q1, q2, q3, q4, q5, q6, q7;
  lcu_action q0, q1, q2, q3, q4, q5, q6, q7;
  inv @ lcu_compute q0, q1, q2, q3, q4, q5, q6, q7;
}

qubit[4] system;
qubit[4] lcu_index;

lcu system[0], system[1], system[2], system[3], lcu_index[0], lcu_index[1], lcu_index[2], lcu_index[3];
