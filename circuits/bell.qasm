// Bell state (|00> + |11>)/√2: Hadamard then CNOT (Nielsen & Chuang, §1.3.6), then measure both.
OPENQASM 3.0;
include "stdgates.inc";

qubit[2] q;
bit[2] c;

h q[0];
cx q[0], q[1];
c = measure q;
