OPENQASM 3.0;
include "stdgates.inc";

qubit[3] q;
bit[2] c;

h q[0];
cx q[0], q[1];
rz(-0) q[2];
rx(1e-7) q[1];
ry(-2.5e+21) q[0];
U(1.5707963267948966, -0.25, 5e-324) q[2];
ctrl(2) @ x q[0], q[1], q[2];
negctrl @ inv @ s q[0], q[1];
pow(0.5) @ sx q[0];
inv @ pow(-3) @ t q[1];
gphase(0.125);
ctrl @ gphase(-1.5) q[2];
barrier q[0], q[1];
c[0] = measure q[0];
c[1] = measure q[1];
reset q[0];
barrier;
