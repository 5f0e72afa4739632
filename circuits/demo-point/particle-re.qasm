OPENQASM 3.0;
include "stdgates.inc";

// prepare_state_0: prepare ground state 0 exactly from |0…0>
gate prepare_state_0 q0, q1, q2, q3 {
  ry(0.8735835220185592) q3;
  ry(1.570796326794897) q2;
  cx q3, q2;
  ry(1.5707963267948961) q2;
  cx q3, q2;
  ry(1.1691439899628382) q1;
  cx q2, q1;
  ry(0.707791247975259) q1;
  cx q3, q1;
  ry(0.4016523368320586) q1;
  cx q2, q1;
  ry(0.8630050788196376) q1;
  cx q3, q1;
  ry(1.1780972450961724) q0;
  cx q1, q0;
  ry(0.39269908169872414) q0;
  cx q2, q0;
  ry(-0.39269908169872414) q0;
  cx q1, q0;
  ry(0.39269908169872414) q0;
  cx q3, q0;
  ry(-0.39269908169872414) q0;
  cx q1, q0;
  ry(-1.1780972450961724) q0;
  cx q2, q0;
  ry(-0.39269908169872414) q0;
  cx q1, q0;
  ry(0.39269908169872414) q0;
  cx q3, q0;
  cx q1, q0;
  rz(1.5707963267948966) q0;
  cx q2, q0;
  cx q1, q0;
  cx q3, q0;
  cx q1, q0;
  rz(-1.5707963267948966) q0;
  cx q2, q0;
  cx q1, q0;
  cx q3, q0;
  cx q3, q2;
  rz(1.5707963267948966) q2;
  cx q3, q2;
  gphase(0.7853981633974483);
}

// creation_0_compute: compute part of creation_0
gate creation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// creation_0_action: action part of creation_0
gate creation_0_action q0, q1, q2, q3, q4 {
  cz q4, q0;
  x q0;
}

// givens_rotation: real Givens rotation R(theta) of two adjacent fermionic modes (number-conserving, no JW string between them)
gate givens_rotation(theta) q0, q1 {
  cx q1, q0;
  cry(2 * theta) q0, q1;
  cx q1, q0;
}

// phased_givens_rotation: SU(2) rotation D(psi) R(theta) D(chi) of two adjacent fermionic modes (one Givens-network element)
gate phased_givens_rotation(theta, psi, chi) q0, q1 {
  p(chi) q0;
  p(-chi) q1;
  givens_rotation(theta) q0, q1;
  p(psi) q0;
  p(-psi) q1;
}

// orbital_rotation: orbital rotation U(V) on 4 modes: phases, then 6 adjacent Givens rotations (rectangular mesh)
gate orbital_rotation q0, q1, q2, q3 {
  p(1.1780972450961724) q0;
  p(1.1780972450961724) q1;
  p(0.39269908169872414) q2;
  p(0.39269908169872414) q3;
  phased_givens_rotation(0, 0.1963495408493621, 0.1963495408493621) q0, q1;
  phased_givens_rotation(0.3217505543966422, -1.1780972450961724, -1.5707963267948966) q2, q3;
  phased_givens_rotation(0, 0.39269908169872414, 0.39269908169872414) q1, q2;
  phased_givens_rotation(0.3217505543966422, -1.1102230246251565e-16, -1.5707963267948966) q0, q1;
  phased_givens_rotation(0, 0, 0) q2, q3;
  phased_givens_rotation(1.5707963267948966, 0, -0) q1, q2;
}

// qft_unswapped_5: quantum Fourier transform of a 5-qubit register without the final swaps
gate qft_unswapped_5 q0, q1, q2, q3, q4 {
  h q4;
  cp(1.5707963267948966) q3, q4;
  cp(0.7853981633974483) q2, q4;
  cp(0.39269908169872414) q1, q4;
  cp(0.19634954084936207) q0, q4;
  h q3;
  cp(1.5707963267948966) q2, q3;
  cp(0.7853981633974483) q1, q3;
  cp(0.39269908169872414) q0, q3;
  h q2;
  cp(1.5707963267948966) q1, q2;
  cp(0.7853981633974483) q0, q2;
  h q1;
  cp(1.5707963267948966) q0, q1;
  h q0;
}

// fourier_adder_5_4_compute: compute part of fourier_adder_5_4
gate fourier_adder_5_4_compute(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8 {
  qft_unswapped_5 q0, q1, q2, q3, q4;
}

// fourier_adder_5_4_action: action part of fourier_adder_5_4
gate fourier_adder_5_4_action(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8 {
  p(offset * 3.141592653589793) q0;
  p(offset * 1.5707963267948966) q1;
  p(offset * 0.7853981633974483) q2;
  p(offset * 0.39269908169872414) q3;
  p(offset * 0.19634954084936207) q4;
  ctrl @ p(w0 * 3.141592653589793) q5, q0;
  ctrl @ p(w0 * 1.5707963267948966) q5, q1;
  ctrl @ p(w0 * 0.7853981633974483) q5, q2;
  ctrl @ p(w0 * 0.39269908169872414) q5, q3;
  ctrl @ p(w0 * 0.19634954084936207) q5, q4;
  ctrl @ p(w1 * 3.141592653589793) q6, q0;
  ctrl @ p(w1 * 1.5707963267948966) q6, q1;
  ctrl @ p(w1 * 0.7853981633974483) q6, q2;
  ctrl @ p(w1 * 0.39269908169872414) q6, q3;
  ctrl @ p(w1 * 0.19634954084936207) q6, q4;
  ctrl @ p(w2 * 3.141592653589793) q7, q0;
  ctrl @ p(w2 * 1.5707963267948966) q7, q1;
  ctrl @ p(w2 * 0.7853981633974483) q7, q2;
  ctrl @ p(w2 * 0.39269908169872414) q7, q3;
  ctrl @ p(w2 * 0.19634954084936207) q7, q4;
  ctrl @ p(w3 * 3.141592653589793) q8, q0;
  ctrl @ p(w3 * 1.5707963267948966) q8, q1;
  ctrl @ p(w3 * 0.7853981633974483) q8, q2;
  ctrl @ p(w3 * 0.39269908169872414) q8, q3;
  ctrl @ p(w3 * 0.19634954084936207) q8, q4;
}

// fourier_adder_5_4: add offset + sum of 4 controlled constants modulo 2^5 (Draper QFT adder)
gate fourier_adder_5_4(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8 {
  fourier_adder_5_4_compute(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8;
  fourier_adder_5_4_action(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8;
  inv @ fourier_adder_5_4_compute(offset, w0, w1, w2, w3) q0, q1, q2, q3, q4, q5, q6, q7, q8;
}

// fast_inverse_compute: compute part of fast_inverse
gate fast_inverse_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q9 {
  orbital_rotation q0, q1, q2, q3;
  fourier_adder_5_4(14, -7, -7, 3, 3) q5, q6, q7, q8, q9, q0, q1, q2, q3;
}

// multiplexed_ry_5: ry on the target by an angle chosen by the value of 5 selector qubits (Gray-code multiplexor)
gate multiplexed_ry_5(t0, t1, t2, t3, t4, t5, t6, t7, t8, t9, t10, t11, t12, t13, t14, t15, t16, t17, t18, t19, t20, t21, t22, t23, t24, t25, t26, t27, t28, t29, t30, t31) q0, q1, q2, q3, q4, q5 {
  ry(t0) q5;
  cx q0, q5;
  ry(t1) q5;
  cx q1, q5;
  ry(t2) q5;
  cx q0, q5;
  ry(t3) q5;
  cx q2, q5;
  ry(t4) q5;
  cx q0, q5;
  ry(t5) q5;
  cx q1, q5;
  ry(t6) q5;
  cx q0, q5;
  ry(t7) q5;
  cx q3, q5;
  ry(t8) q5;
  cx q0, q5;
  ry(t9) q5;
  cx q1, q5;
  ry(t10) q5;
  cx q0, q5;
  ry(t11) q5;
  cx q2, q5;
  ry(t12) q5;
  cx q0, q5;
  ry(t13) q5;
  cx q1, q5;
  ry(t14) q5;
  cx q0, q5;
  ry(t15) q5;
  cx q4, q5;
  ry(t16) q5;
  cx q0, q5;
  ry(t17) q5;
  cx q1, q5;
  ry(t18) q5;
  cx q0, q5;
  ry(t19) q5;
  cx q2, q5;
  ry(t20) q5;
  cx q0, q5;
  ry(t21) q5;
  cx q1, q5;
  ry(t22) q5;
  cx q0, q5;
  ry(t23) q5;
  cx q3, q5;
  ry(t24) q5;
  cx q0, q5;
  ry(t25) q5;
  cx q1, q5;
  ry(t26) q5;
  cx q0, q5;
  ry(t27) q5;
  cx q2, q5;
  ry(t28) q5;
  cx q0, q5;
  ry(t29) q5;
  cx q1, q5;
  ry(t30) q5;
  cx q0, q5;
  ry(t31) q5;
  cx q4, q5;
}

// multiplexed_rz_5: rz on the target by an angle chosen by the value of 5 selector qubits (Gray-code multiplexor)
gate multiplexed_rz_5(t0, t1, t2, t3, t4, t5, t6, t7, t8, t9, t10, t11, t12, t13, t14, t15, t16, t17, t18, t19, t20, t21, t22, t23, t24, t25, t26, t27, t28, t29, t30, t31) q0, q1, q2, q3, q4, q5 {
  rz(t0) q5;
  cx q0, q5;
  rz(t1) q5;
  cx q1, q5;
  rz(t2) q5;
  cx q0, q5;
  rz(t3) q5;
  cx q2, q5;
  rz(t4) q5;
  cx q0, q5;
  rz(t5) q5;
  cx q1, q5;
  rz(t6) q5;
  cx q0, q5;
  rz(t7) q5;
  cx q3, q5;
  rz(t8) q5;
  cx q0, q5;
  rz(t9) q5;
  cx q1, q5;
  rz(t10) q5;
  cx q0, q5;
  rz(t11) q5;
  cx q2, q5;
  rz(t12) q5;
  cx q0, q5;
  rz(t13) q5;
  cx q1, q5;
  rz(t14) q5;
  cx q0, q5;
  rz(t15) q5;
  cx q4, q5;
  rz(t16) q5;
  cx q0, q5;
  rz(t17) q5;
  cx q1, q5;
  rz(t18) q5;
  cx q0, q5;
  rz(t19) q5;
  cx q2, q5;
  rz(t20) q5;
  cx q0, q5;
  rz(t21) q5;
  cx q1, q5;
  rz(t22) q5;
  cx q0, q5;
  rz(t23) q5;
  cx q3, q5;
  rz(t24) q5;
  cx q0, q5;
  rz(t25) q5;
  cx q1, q5;
  rz(t26) q5;
  cx q0, q5;
  rz(t27) q5;
  cx q2, q5;
  rz(t28) q5;
  cx q0, q5;
  rz(t29) q5;
  cx q1, q5;
  rz(t30) q5;
  cx q0, q5;
  rz(t31) q5;
  cx q4, q5;
}

// fast_inverse_action: action part of fast_inverse
gate fast_inverse_action q0, q1, q2, q3, q4, q5, q6, q7, q8, q9 {
  multiplexed_ry_5(0.5625188335347366, 0.023627361146604235, -0.17136241817172945, -0.08591272866944608, 0.006085890786524786, -0.035337309015310236, -0.1371212974033034, -0.16249822069799677, 0.0007069178633844903, -0.27806360153355913, -0.1985424475766915, 0.14702819491678057, 0.05967158802529894, 0.2783693412146526, -0.12195695554814076, 0.11278707414835452, -0.2117452814935976, -0.12629559199131418, 0.2740307047714793, -0.2648607676166531, 0.15136683135995396, 0.1259899080652606, 0.04646875410839292, 0.005045554306557884, -0.15815958425482338, 0.1874110582386487, 0.28919504662664186, 0.01042452722969818, -0.41044508431139815, -0.17570105461490285, 0.01928872470343085, 0.23798647789278451) q5, q6, q7, q8, q9, q4;
  multiplexed_rz_5(1.5897348104169056, 0.16713249723219525, -0.2216727227555653, -0.1731943404018815, 0.15681732362356196, 0.13416632070655785, -0.2037337390646278, -0.21666467990385352, 0.15532663440230257, -0.5624227414887795, -0.23782499359959833, 0.5155063260477136, 0.18829281092793995, 0.870494745304564, -0.19435465409762623, 0.49756734235677613, -0.2454866018297708, -0.19700821947608704, 0.8678411799261033, -0.554761133258607, 0.5181598914261745, 0.5052289505869486, 0.18063120269776747, 0.1579801997807634, -0.2140111145253927, 0.5393202051219191, 0.8772202648931048, 0.15947088900202272, -0.9162482845884284, -0.22432628813402605, 0.16447893185373444, 0.8466808662303585) q5, q6, q7, q8, q9, q4;
}

// qsvt_compute: compute part of qsvt
gate qsvt_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14 {
  h q14;
}

// qsvt_phase: signal-projector-controlled phase e^{i theta/2 (2Pi - I)}, sign set by the QSVT qubit
gate qsvt_phase(theta) q0, q1, q2, q3, q4, q5 {
  negctrl(5) @ x q0, q1, q2, q3, q4, q5;
  rz(theta) q5;
  negctrl(5) @ x q0, q1, q2, q3, q4, q5;
}

// lcu_prepare: PREPARE of I - (w - b0 - A)^-1 B'
gate lcu_prepare q0 {
  ry(1.5393369102770091) q0;
}

// lcu_compute: compute part of lcu
gate lcu_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13 {
  lcu_prepare q4;
}

// identity: identity on 4 qubits
gate identity q0, q1, q2, q3 {
}

// lcu_prepare_2: PREPARE of B' (two-body, identity moved into w)
gate lcu_prepare_2 q0, q1, q2 {
  ry(1.2309594173407745) q2;
  ry(0.7853981633974483) q1;
  cx q2, q1;
  ry(0.7853981633974483) q1;
  cx q2, q1;
  ry(1.1780972450961724) q0;
  cx q1, q0;
  ry(0.39269908169872414) q0;
  cx q2, q0;
  ry(-0.39269908169872414) q0;
  cx q1, q0;
  ry(0.39269908169872414) q0;
  cx q2, q0;
}

// lcu_compute_2: compute part of lcu
gate lcu_compute_2 q0, q1, q2, q3, q4, q5, q6 {
  lcu_prepare_2 q4, q5, q6;
}

// pauli_string: Pauli string Z0
gate pauli_string q0, q1, q2, q3 {
  z q0;
}

// pauli_string_2: Pauli string Z2
gate pauli_string_2 q0, q1, q2, q3 {
  z q2;
}

// pauli_string_3: Pauli string Z0 Z2
gate pauli_string_3 q0, q1, q2, q3 {
  z q0;
  z q2;
}

// pauli_string_4: Pauli string Z1
gate pauli_string_4 q0, q1, q2, q3 {
  z q1;
}

// pauli_string_5: Pauli string Z3
gate pauli_string_5 q0, q1, q2, q3 {
  z q3;
}

// pauli_string_6: Pauli string Z1 Z3
gate pauli_string_6 q0, q1, q2, q3 {
  z q1;
  z q3;
}

// lcu_action: action part of lcu
gate lcu_action q0, q1, q2, q3, q4, q5, q6 {
  negctrl(3) @ pauli_string q4, q5, q6, q0, q1, q2, q3;
  negctrl(3) @ gphase(3.141592653589793) q4, q5, q6;
  ctrl @ negctrl(2) @ pauli_string_2 q4, q5, q6, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ gphase(3.141592653589793) q4, q5, q6;
  ctrl @ negctrl(2) @ pauli_string_3 q5, q4, q6, q0, q1, q2, q3;
  ctrl(2) @ negctrl @ pauli_string_4 q4, q5, q6, q0, q1, q2, q3;
  ctrl(2) @ negctrl @ gphase(3.141592653589793) q4, q5, q6;
  ctrl @ negctrl(2) @ pauli_string_5 q6, q4, q5, q0, q1, q2, q3;
  ctrl @ negctrl(2) @ gphase(3.141592653589793) q6, q4, q5;
  ctrl(2) @ negctrl @ pauli_string_6 q4, q6, q5, q0, q1, q2, q3;
}

// product_c2n0: block-encoding of (w - b0 - A)^-1 B' (2 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate product_c2n0 c0, c1, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12 {
  lcu_compute_2 q0, q1, q2, q3, q5, q6, q7;
  ctrl(2) @ lcu_action c0, c1, q0, q1, q2, q3, q5, q6, q7;
  inv @ lcu_compute_2 q0, q1, q2, q3, q5, q6, q7;
  fast_inverse_compute q0, q1, q2, q3, q4, q8, q9, q10, q11, q12;
  ctrl(2) @ fast_inverse_action c0, c1, q0, q1, q2, q3, q4, q8, q9, q10, q11, q12;
  inv @ fast_inverse_compute q0, q1, q2, q3, q4, q8, q9, q10, q11, q12;
}

// lcu_action_c1n0: action part of lcu (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate lcu_action_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13 {
  ctrl @ negctrl @ identity c0, q4, q0, q1, q2, q3;
  product_c2n0 c0, q4, q0, q1, q2, q3, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  ctrl(2) @ gphase(3.141592653589793) c0, q4;
}

// adjoint_c1n0: block-encoding of (I - (w - b0 - A)^-1 B')† (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate adjoint_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13 {
  lcu_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  inv @ lcu_action_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  inv @ lcu_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
}

// qsvt_step_c1n0: one U, phase, U-dagger, phase step of the QSVT of (I - (w - b0 - A)^-1 B')† (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate qsvt_step_c1n0(theta_a, theta_b) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14 {
  adjoint_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  ctrl @ qsvt_phase(theta_a) c0, q4, q5, q6, q7, q8, q14;
  inv @ adjoint_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  ctrl @ qsvt_phase(theta_b) c0, q4, q5, q6, q7, q8, q14;
}

// qsvt_action_c1n0: action part of qsvt (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate qsvt_action_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14 {
  ctrl @ qsvt_phase(-1.9228429959383675e-9) c0, q4, q5, q6, q7, q8, q14;
  qsvt_step_c1n0(-3.14159265062607, -3.141592658108677) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592646757378, -3.1415926638476366) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592638285607, -3.141592676289819) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415926201077036, -3.141592702706684) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592581923115, -3.1415927576041205) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592503423712, -3.14159286924612) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592345504649, -3.1415930914170636) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592034629104, -3.1415935240641595) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.14159143576183, -3.1415943485414624) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415903067979984, -3.141595886116987) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141588223986822, -3.1415986923404735) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415844634018875, -3.141603704803573) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415778181502536, -3.141612467502886) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415663251777683, -3.141627460777941) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415468701435643, -3.141652570416629) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415146354543384, -3.1416937311035515) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1414623574086495, -3.141759775372193) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141379366331528, -3.141863506597775) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1412504016535534, -3.1420229903615575) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1410542247759237, -3.1422630206005056) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.140762097584433, -3.1426166651013956) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1403362524783067, -3.143126731903167) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.139728546102922, -3.143846930703897) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.138879554909754, -3.144842442071256) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.137718423914001, -3.146189565614411) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.136163806574497, -3.1479741099536924) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1341262212848755, -3.1502882221317563) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.131512092340972, -3.153225433638397) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.128229644151777, -3.156873815236572) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.124196691166682, -3.1613072653155068) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1193502317743738, -3.1665750894277247) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1136576228238773, -3.1726901632359414) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.107128963971396, -3.179616147875524) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.099830091740581, -3.187254537634825) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0918951582826284, -3.1954328901231204) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0835370306371015, -3.2038965038079645) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0750526775519904, -3.212306968832081) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.066819570738455, -3.2202519647998504) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.2202519647998504, -3.066819570738455) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.212306968832081, -3.0750526775519904) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.2038965038079645, -3.0835370306371015) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1954328901231204, -3.0918951582826284) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.187254537634825, -3.099830091740581) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.179616147875524, -3.107128963971396) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1726901632359414, -3.1136576228238773) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1665750894277247, -3.1193502317743738) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1613072653155068, -3.124196691166682) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.156873815236572, -3.128229644151777) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.153225433638397, -3.131512092340972) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1502882221317563, -3.1341262212848755) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1479741099536924, -3.136163806574497) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.146189565614411, -3.137718423914001) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.144842442071256, -3.138879554909754) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.143846930703897, -3.139728546102922) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.143126731903167, -3.1403362524783067) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1426166651013956, -3.140762097584433) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1422630206005056, -3.1410542247759237) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1420229903615575, -3.1412504016535534) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141863506597775, -3.141379366331528) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141759775372193, -3.1414623574086495) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416937311035515, -3.1415146354543384) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141652570416629, -3.1415468701435643) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141627460777941, -3.1415663251777683) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141612467502886, -3.1415778181502536) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141603704803573, -3.1415844634018875) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415986923404735, -3.141588223986822) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141595886116987, -3.1415903067979984) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415943485414624, -3.14159143576183) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415935240641595, -3.141592034629104) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415930914170636, -3.141592345504649) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.14159286924612, -3.141592503423712) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415927576041205, -3.141592581923115) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592702706684, -3.1415926201077036) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592676289819, -3.141592638285607) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415926638476366, -3.141592646757378) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592658108677, -3.14159265062607) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  adjoint_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  ctrl @ qsvt_phase(3.14159265166695) c0, q4, q5, q6, q7, q8, q14;
}

// product_c1n0: block-encoding of (I - (w - b0 - A)^-1 B')^-1 · (w - A)^-1 (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate product_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14, q15 {
  fast_inverse_compute q0, q1, q2, q3, q10, q11, q12, q13, q14, q15;
  ctrl @ fast_inverse_action c0, q0, q1, q2, q3, q10, q11, q12, q13, q14, q15;
  inv @ fast_inverse_compute q0, q1, q2, q3, q10, q11, q12, q13, q14, q15;
  qsvt_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q11, q12, q13, q14, q15, q9;
  qsvt_action_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q11, q12, q13, q14, q15, q9;
  inv @ qsvt_compute q0, q1, q2, q3, q4, q5, q6, q7, q8, q11, q12, q13, q14, q15, q9;
}

// annihilation_0_compute: compute part of annihilation_0
gate annihilation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// annihilation_0_action: action part of annihilation_0
gate annihilation_0_action q0, q1, q2, q3, q4 {
  x q0;
  cz q4, q0;
}

// product_c1n0_2: block-encoding of a_0 · R(w⁺) · a†_0 (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate product_c1n0_2 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14, q15, q16, q17 {
  creation_0_compute q0, q1, q2, q3, q12;
  ctrl @ creation_0_action c0, q0, q1, q2, q3, q12;
  inv @ creation_0_compute q0, q1, q2, q3, q12;
  product_c1n0 c0, q0, q1, q2, q3, q5, q6, q7, q8, q9, q10, q11, q13, q14, q15, q16, q17;
  annihilation_0_compute q0, q1, q2, q3, q4;
  ctrl @ annihilation_0_action c0, q0, q1, q2, q3, q4;
  inv @ annihilation_0_compute q0, q1, q2, q3, q4;
}

qubit[4] system;
qubit[14] ancilla;
qubit[1] test;
bit[1] result;

prepare_state_0 system[0], system[1], system[2], system[3];
h test[0];
product_c1n0_2 test[0], system[0], system[1], system[2], system[3], ancilla[0], ancilla[1], ancilla[2], ancilla[3], ancilla[4], ancilla[5], ancilla[6], ancilla[7], ancilla[8], ancilla[9], ancilla[10], ancilla[11], ancilla[12], ancilla[13];
h test[0];
result[0] = measure test[0];
