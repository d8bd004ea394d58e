"""Reference fixtures for forecast reconciliation (MinT, OLS, bottom-up) and the shrunk error covariance.

Closed forms of S. L. Wickramasuriya, G. Athanasopoulos and R. J. Hyndman (2019), Optimal forecast reconciliation
for hierarchical and grouped time series through trace minimization, JASA 114, 804-819:
  y~ = S (S' W^-1 S)^-1 S' W^-1 y^   (W = shrunk covariance for MinT, W = I for OLS)
  bottom-up: y~ = S (0 | I) y^
and their shrinkage estimator with a diagonal target (Schafer and Strimmer 2005, target D):
  W = lambda diag(W1) + (1 - lambda) W1, W1 = E'E / T, lambda = sum_{i!=j} Var(r_ij) / sum_{i!=j} r_ij^2.
Computed with numpy's dense inverses and solves, a different route from ebbflow's (a constraint projection solved
by Cholesky). The grouped case (a total broken down two ways) has no summing matrix over existing series; there the
reference is the projection y^ - W C'(C W C')^-1 C y^ computed with numpy.linalg.solve.
Run by hand from the repository root:  /usr/bin/python3 test/reference/reconcile.py
Writes test/reference/reconcile.json (numpy and Python versions recorded inside).
"""
import json
import platform

import numpy as np

rng = np.random.default_rng(20191)


def shrink(e):
    t = e.shape[0]
    w1 = e.T @ e / t
    sd = np.sqrt(np.diag(w1))
    z = e / sd
    v = ((z**2).T @ (z**2) - (z.T @ z) ** 2 / t) / (t * (t - 1))
    r = w1 / np.outer(sd, sd)
    off = ~np.eye(e.shape[1], dtype=bool)
    lam = float(np.clip(v[off].sum() / (r[off] ** 2).sum(), 0, 1))
    return lam * np.diag(np.diag(w1)) + (1 - lam) * w1, lam


def s_form(s, w, yhat):
    wi = np.linalg.inv(w)
    return s @ np.linalg.inv(s.T @ wi @ s) @ s.T @ wi @ yhat


def case_tree(name, parents, t, h):
    """parents[i] = index of the total series i belongs to, or -1 for the top; leaves are series with no part."""
    n = len(parents)
    leaves = [i for i in range(n) if i not in parents]
    s = np.zeros((n, len(leaves)))
    for j, leaf in enumerate(leaves):
        i = leaf
        while i != -1:
            s[i, j] = 1
            i = parents[i]
    b = rng.gamma(4.0, 25.0, size=(len(leaves), h))
    truth = s @ b
    yhat = truth + rng.normal(0, 5.0, size=truth.shape)
    e = rng.multivariate_normal(np.zeros(n), np.diag(rng.uniform(1, 9, n)) + 2.0, size=t)
    w, lam = shrink(e)
    bu = s @ yhat[leaves, :]
    constraints = [{"total": k, "parts": [i for i in range(n) if parents[i] == k]} for k in range(n) if k in parents]
    return {
        "name": name,
        "n": n,
        "h": h,
        "constraints": constraints,
        "base": yhat.tolist(),
        "errors": e.T.tolist(),
        "lambda": lam,
        "w": w.tolist(),
        "mint": s_form(s, w, yhat).tolist(),
        "ols": s_form(s, np.eye(n), yhat).tolist(),
        "bottomUp": bu.tolist(),
    }


def case_grouped(t, h):
    # 0 = total, 1..2 = regions, 3..4 = channels: total = 1 + 2 = 3 + 4.
    n = 5
    c = np.array([[1, -1, -1, 0, 0], [1, 0, 0, -1, -1]], dtype=float)
    yhat = rng.gamma(4.0, 25.0, size=(n, h))
    yhat[0] *= 2
    e = rng.normal(0, 3.0, size=(t, n))
    w, lam = shrink(e)

    def project(wm):
        return yhat - wm @ c.T @ np.linalg.solve(c @ wm @ c.T, c @ yhat)

    return {
        "name": "grouped",
        "n": n,
        "h": h,
        "constraints": [{"total": 0, "parts": [1, 2]}, {"total": 0, "parts": [3, 4]}],
        "base": yhat.tolist(),
        "errors": e.T.tolist(),
        "lambda": lam,
        "w": w.tolist(),
        "mint": project(w).tolist(),
        "ols": project(np.eye(n)).tolist(),
    }


cases = [
    case_tree("two-level", [-1, 0, 0, 0], 48, 6),
    case_tree("nested", [-1, 0, 0, 1, 1, 2, 2, 2], 60, 12),
    case_tree("short-errors", [-1, 0, 0], 5, 3),
    case_grouped(36, 4),
]
out = {
    "generatedBy": "test/reference/reconcile.py",
    "numpy": np.__version__,
    "python": platform.python_version(),
    "seed": 20191,
    "source": "closed forms of Wickramasuriya, Athanasopoulos & Hyndman (2019): MinT, OLS, bottom-up, shrunk covariance",
    "cases": cases,
}
with open("test/reference/reconcile.json", "w") as f:
    json.dump(out, f)
