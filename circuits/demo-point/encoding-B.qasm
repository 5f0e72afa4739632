OPENQASM 3.0;
include "stdgates.inc";

// lcu_prepare: PREPARE of B (two-body)
gate lcu_prepare q0, q1, q2 {
  ry(1.318116071652818) q2;
  ry(1.3001989116726702) q1;
  cx q2, q1;
  ry(0.06923949433189558) q1;
  cx q2, q1;
  ry(1.093138017732642) q0;
  cx q1, q0;
  ry(0.3077398543351937) q0;
  cx q2, q0;
  ry(-0.4776583090622546) q0;
  cx q1, q0;
  ry(0.3077398543351937) q0;
  cx q2, q0;
}

// lcu_compute: compute part of lcu
gate lcu_compute q0, q1, q2, q3, q4, q5, q6 {
  lcu_prepare q4, q5, q6;
}

// pauli_string: Pauli string I
gate pauli_string q0, q1, q2, q3 {
}

// pauli_string_2: Pauli string Z0
gate pauli_string_2 q0, q1, q2, q3 {
  z q0;
}

// pauli_string_3: Pauli string Z2
gate pauli_string_3 q0, q1, q2, q3 {
  z q2;
}

// pauli_string_4: Pauli string Z0 Z2
gate pauli_string_4 q0, q1, q2, q3 {
  z q0;
  z q2;
}

// pauli_string_5: Pauli string Z1
gate pauli_string_5 q0, q1, q2, q3 {
  z q1;
}

// pauli_string_6: Pauli string Z3
gate pauli_string_6 q0, q1, q2, q3 {
  z q3;
}

// pauli_string_7: Pauli string Z1 Z3
gate pauli_string_7 q0, q1, q2, q3 {
  z q1;
  z q3;
}

// lcu_action: action part of lcu
gate lcu_action q0, q1, q2, q3, q4, q5, q6 {
  negctrl(3) @ pauli_string q4, q5, q6, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ pauli_string_2 q4, q5, q6, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ gphase(3.141592653589793) q4, q5, q6;
  ctrl @ negctrl(2) @ pauli_string_3 q5, q4, q6, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ gphase(3.141592653589793) q5, q4, q6;
  ctrl(2) @ negctrl @ pauli_string_4 q4, q5, q6, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ pauli_string_5 q6, q4, q5, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ gphase(3.141592653589793) q6, q4, q5;
  ctrl(2) @ negctrl @ pauli_string_6 q4, q6, q5, q0, q1, q2, q3;
  ctrl(2) @ negctrl @ gphase(3.141592653589793) q4, q6, q5;
  ctrl(2) @ negctrl @ pauli_string_7 q5, q6, q4, q0, q1, q2, q3;
}

// lcu: block-encoding of B (two-body) by PREPARE/SELECT
gate lcu q0, q1, q2, q3, q4, q5, q6 {
  lcu_compute q0, q1, q2, q3, q4, q5, q6;
  lcu_action q0, q1, q2, q3, q4, q5, q6;
  inv @ lcu_compute q0, q1, q2, q3, q4, q5, q6;
}

qubit[4] system;
qubit[3] lcu_index;

lcu system[0], system[1], system[2], system[3], lcu_index[0], lcu_index[1], lcu_index[2];
