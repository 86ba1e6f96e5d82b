"""Reference figures for test/nn/lbfgs.test.ts from SciPy's L-BFGS-B (measured with SciPy 1.17.1).

Not run by the test suite (CI has no SciPy); kept so the recorded figures can be reproduced.

    python3 lbfgsb_reference.py               # Rosenbrock only
    python3 lbfgsb_reference.py starts.json   # and XOR

starts.json: a JSON array of the 100 parameter vectors
initParams({inputs: 2, width: 2, outputs: 1, activation: 'tanh', head: 'logistic'},
'nguyen-widrow', rngFor(1, 2, r)) for r = 0..99 (src/nn/network.ts, src/nn/rng.ts), in the
engine's layout: W1 (2 x 2, row i = input i), b1 (2), W2 (2), b2 (1).
"""
import json
import sys

import numpy as np
from scipy.optimize import minimize, rosen, rosen_der

x0 = np.array([-1.2, 1.0])
r = minimize(rosen, x0, jac=rosen_der, method="L-BFGS-B", options={"gtol": 1e-10, "ftol": 0})
print("rosenbrock gtol 1e-10: %d iterations, %d evaluations, max |x - 1| %.3g" % (r.nit, r.nfev, np.max(np.abs(r.x - 1))))
r = minimize(rosen, x0, jac=rosen_der, method="L-BFGS-B")
print("rosenbrock defaults: %d iterations, %d evaluations, max |x - 1| %.3g" % (r.nit, r.nfev, np.max(np.abs(r.x - 1))))

if len(sys.argv) < 2:
    sys.exit(0)

X = np.array([[-1, -1], [-1, 1], [1, -1], [1, 1]], float)
Y = np.array([0, 1, 1, 0], float)


def unpack(p):
    return p[0:4].reshape(2, 2), p[4:6], p[6:8], p[8]


def loss_and_grad(p):
    """Summed cross-entropy of a logistic head on tanh hidden units, and its exact gradient."""
    W1, b1, W2, b2 = unpack(p)
    h = np.tanh(X @ W1 + b1)
    z = h @ W2 + b2
    loss = np.sum(np.logaddexp(0, z) - Y * z)
    dz = 1 / (1 + np.exp(-z)) - Y
    dh = np.outer(dz, W2) * (1 - h * h)
    return loss, np.concatenate([(X.T @ dh).ravel(), dh.sum(0), h.T @ dz, [dz.sum()]])


def accuracy(p):
    W1, b1, W2, b2 = unpack(p)
    z = np.tanh(X @ W1 + b1) @ W2 + b2
    return np.mean((z > 0) == (Y == 1))


solved = []
for i, start in enumerate(json.load(open(sys.argv[1]))):
    hit = [False]

    def stop_when_solved(xk):
        if accuracy(xk) == 1:
            hit[0] = True
            raise StopIteration

    res = minimize(loss_and_grad, np.array(start), jac=True, method="L-BFGS-B",
                   callback=stop_when_solved, options={"maxfun": 2000})
    if hit[0] or accuracy(res.x) == 1:
        solved.append(i)
print("xor: %d of %d starts reach 100%%: %s" % (len(solved), i + 1, solved))
