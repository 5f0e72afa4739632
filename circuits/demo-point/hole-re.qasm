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

// annihilation_0_compute: compute part of annihilation_0
gate annihilation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// annihilation_0_action: action part of annihilation_0
gate annihilation_0_action q0, q1, q2, q3, q4 {
  x q0;
  cz q4, q0;
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
  multiplexed_ry_5(0.45147579306177044, 0.08163971370711412, -0.06245617459925318, 0.11049650150948835, -0.008730524984506605, 0.06368234685351926, -0.11711378562203396, 0.007356604814254486, 0.18127099504359573, -0.18856501382526036, -0.11023204337582199, 0.06272070321871978, 0.19922836189719056, 0.2716413042210167, -0.007092146680588107, 0.11737831424150054, -0.19032355242838622, -0.01737087631964463, 0.26136257458196016, -0.10847350477269617, 0.0729994328577763, 0.19746982329406476, 0.1191368528446264, 0.19154972468265224, 0.017635334453311002, 0.1905880810478528, 0.371384213523406, 0.0015482046545499117, -0.19720536516039838, -0.07273490423830971, 0.0713609840680576, 0.1437739263918837) q5, q6, q7, q8, q9, q4;
  multiplexed_rz_5(-1.0736266094297506, -0.11581289040784452, 0.3598061255685539, -0.010569543261909287, -0.024903934486081414, 0.09903009084746861, 0.2175772898187839, 0.28945441513279, -0.08080940094513084, 0.4853797176572758, 0.4692939069253894, -0.29270636232457325, -0.29565238220044393, -0.5633429572863934, 0.16926994853069005, -0.15047752657480323, 0.5499242401041529, 0.1795485712736897, -0.5530643345433937, 0.4047493844785122, -0.3029849850675729, -0.23110785975356674, -0.2150220490216804, -0.09108802368813043, 0.2791757923897904, -0.4828244768601722, -0.6013716758314875, -0.035182557229081035, 0.6898322234170469, 0.37008474831155347, -0.10553426766484492, -0.3732248427507943) q5, q6, q7, q8, q9, q4;
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
  ry(1.772149722832506) q0;
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
  ctrl @ qsvt_phase(-1.8188066608360032e-9) c0, q4, q5, q6, q7, q8, q14;
  qsvt_step_c1n0(-3.141592651052586, -3.141592657104137) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592648749521, -3.141592660224594) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415926445330298, -3.141592665905794) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592636901016, -3.1415926761273325) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415926232536426, -3.141592694291773) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415925991532294, -3.141592726166698) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592557129831, -3.1415927813931677) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415924847836787, -3.141592875863271) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592361818128, -3.141593035407959) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592155474511, -3.1415933014251443) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415918136221346, -3.141593739328365) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141591254471615, -3.1415944510183427) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415903515189614, -3.1415955929802575) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415889118876605, -3.1415974020881507) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415866457218096, -3.1416002317429026) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415831237145757, -3.141604601552984) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415777192722105, -3.1416112643364893) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415695312791367, -3.14162129469932) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415572830392944, -3.1416362037168355) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415391928502907, -3.1416580841715462) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141512811977817, -3.1416897902070744) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1414748267182584, -3.141735153963103) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.14142082295355, -3.141799239576989) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1413450142812214, -3.1418886317297487) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141239938558628, -3.1420117516038566) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141096132555357, -3.1421791877482237) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1409018002488893, -3.142404023106146) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1406424968422595, -3.142702132733059) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.140300857353658, -3.1430924200835064) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.139856404965414, -3.143596953921476) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1392854794196463, -3.1442409637508275) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1385613287504355, -3.145052650013181) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1376544077646966, -3.1460627668437584) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1365329233830743, -3.1473039402706933) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.13516366009019, -3.148809693276548) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.133513108704077, -3.150613160457068) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1315489093645335, -3.1527454879981147) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.129241606304862, -3.1552339280759707) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.126566698770261, -3.158099649689395) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1235069597860665, -3.1613553006269473) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1200549811978506, -3.16500237000389) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1162158860259668, -3.1690284223628313) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.112010121610038, -3.173404309945872) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.10747620124459, -3.17808152766808) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1026731903498175, -3.182989961557619) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.097682632719778, -3.188036394268194) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0926094912311024, -3.193104254193429) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0875815621301843, -3.1980551898922767) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.0827467621741573, -3.2027330585726106) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.2027330585726106, -3.0827467621741573) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1980551898922767, -3.0875815621301843) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.193104254193429, -3.0926094912311024) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.188036394268194, -3.097682632719778) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.182989961557619, -3.1026731903498175) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.17808152766808, -3.10747620124459) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.173404309945872, -3.112010121610038) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1690284223628313, -3.1162158860259668) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.16500237000389, -3.1200549811978506) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1613553006269473, -3.1235069597860665) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.158099649689395, -3.126566698770261) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1552339280759707, -3.129241606304862) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1527454879981147, -3.1315489093645335) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.150613160457068, -3.133513108704077) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.148809693276548, -3.13516366009019) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1473039402706933, -3.1365329233830743) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1460627668437584, -3.1376544077646966) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.145052650013181, -3.1385613287504355) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1442409637508275, -3.1392854794196463) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.143596953921476, -3.139856404965414) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1430924200835064, -3.140300857353658) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.142702132733059, -3.1406424968422595) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.142404023106146, -3.1409018002488893) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1421791877482237, -3.141096132555357) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1420117516038566, -3.141239938558628) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1418886317297487, -3.1413450142812214) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141799239576989, -3.14142082295355) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141735153963103, -3.1414748267182584) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416897902070744, -3.141512811977817) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416580841715462, -3.1415391928502907) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416362037168355, -3.1415572830392944) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.14162129469932, -3.1415695312791367) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416112643364893, -3.1415777192722105) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141604601552984, -3.1415831237145757) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1416002317429026, -3.1415866457218096) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415974020881507, -3.1415889118876605) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415955929802575, -3.1415903515189614) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415944510183427, -3.141591254471615) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141593739328365, -3.1415918136221346) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415933014251443, -3.141592155474511) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141593035407959, -3.141592361818128) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592875863271, -3.1415924847836787) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415927813931677, -3.141592557129831) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592726166698, -3.1415925991532294) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592694291773, -3.1415926232536426) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.1415926761273325, -3.141592636901016) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592665905794, -3.1415926445330298) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592660224594, -3.141592648749521) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  qsvt_step_c1n0(-3.141592657104137, -3.141592651052586) c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14;
  adjoint_c1n0 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13;
  ctrl @ qsvt_phase(3.1415926517709867) c0, q4, q5, q6, q7, q8, q14;
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

// creation_0_compute: compute part of creation_0
gate creation_0_compute q0, q1, q2, q3, q4 {
  h q4;
}

// creation_0_action: action part of creation_0
gate creation_0_action q0, q1, q2, q3, q4 {
  cz q4, q0;
  x q0;
}

// product_c1n0_2: block-encoding of a†_0 · R(w⁻) · a_0 (1 control and 0 negative-control qubits first, distributed to the body; compute parts stay uncontrolled)
gate product_c1n0_2 c0, q0, q1, q2, q3, q4, q5, q6, q7, q8, q9, q10, q11, q12, q13, q14, q15, q16, q17 {
  annihilation_0_compute q0, q1, q2, q3, q12;
  ctrl @ annihilation_0_action c0, q0, q1, q2, q3, q12;
  inv @ annihilation_0_compute q0, q1, q2, q3, q12;
  product_c1n0 c0, q0, q1, q2, q3, q5, q6, q7, q8, q9, q10, q11, q13, q14, q15, q16, q17;
  creation_0_compute q0, q1, q2, q3, q4;
  ctrl @ creation_0_action c0, q0, q1, q2, q3, q4;
  inv @ creation_0_compute q0, q1, q2, q3, q4;
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
