# Reference fixtures for ARIMA by conditional sum of squares (src/analyse/forecast/arima.ts).
# Run by hand from the repository root:  Rscript test/reference/arima.R
# Writes test/reference/arima.json with stats::arima(method = "CSS") and predict() on R's built-in datasets.
library(jsonlite)

num <- function(x) as.numeric(x)
cases <- list(
  list(name = "LakeHuron", y = LakeHuron, p = 2, d = 0, q = 0, constant = TRUE),
  list(name = "lh", y = lh, p = 1, d = 0, q = 1, constant = TRUE),
  list(name = "Nile", y = Nile, p = 0, d = 1, q = 1, constant = FALSE),
  list(name = "WWWusage", y = WWWusage, p = 1, d = 1, q = 1, constant = FALSE),
  list(name = "austres", y = austres, p = 2, d = 1, q = 0, constant = TRUE),
  list(name = "BJsales", y = BJsales, p = 1, d = 1, q = 1, constant = TRUE)
)
h <- 10
out_cases <- lapply(cases, function(k) {
  y <- k$y
  n <- length(y)
  drift <- k$d == 1 && k$constant
  xreg <- if (drift) matrix(seq_len(n), ncol = 1) else NULL
  fit <- arima(y, order = c(k$p, k$d, k$q), include.mean = k$d == 0 && k$constant, xreg = xreg, method = "CSS")
  newxreg <- if (drift) matrix(n + seq_len(h), ncol = 1) else NULL
  pr <- predict(fit, n.ahead = h, newxreg = newxreg)
  co <- coef(fit)
  ar <- if (k$p > 0) unname(co[paste0("ar", seq_len(k$p))]) else numeric(0)
  ma <- if (k$q > 0) unname(co[paste0("ma", seq_len(k$q))]) else numeric(0)
  constant <- if (drift) unname(co[length(co)]) else if (k$d == 0 && k$constant) unname(co["intercept"]) else 0
  call <- sprintf("arima(y, order = c(%d, %d, %d), include.mean = %s%s, method = \"CSS\"); predict(fit, n.ahead = %d)",
                  k$p, k$d, k$q, k$d == 0 && k$constant, if (drift) ", xreg = 1:n" else "", h)
  list(name = k$name, call = call, p = k$p, d = k$d, q = k$q, constant = k$constant, values = num(y),
       ar = I(ar), ma = I(ma), mu = constant, sigma2 = fit$sigma2, mean = num(pr$pred), se = num(pr$se))
})
out <- list(generator = "test/reference/arima.R", R = R.version.string,
            stats = as.character(packageVersion("stats")), cases = out_cases)
writeLines(toJSON(out, digits = NA, auto_unbox = TRUE, pretty = FALSE), "test/reference/arima.json")
