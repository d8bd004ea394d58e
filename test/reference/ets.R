# Reference fixtures for the ETS engine (src/analyse/forecast/ets*.ts).
# Run by hand from the repository root:  Rscript test/reference/ets.R
# Writes test/reference/ets.json. Uses R's built-in datasets and forecast::ets / stats::HoltWinters.
suppressPackageStartupMessages(library(forecast))
library(jsonlite)

num <- function(x) as.numeric(x)
series <- list(
  AirPassengers = AirPassengers, UKgas = UKgas, USAccDeaths = USAccDeaths, nottem = nottem,
  austres = austres, JohnsonJohnson = JohnsonJohnson, ldeaths = ldeaths, mdeaths = mdeaths,
  fdeaths = fdeaths, UKDriverDeaths = UKDriverDeaths, Nile = Nile, WWWusage = WWWusage,
  BJsales = BJsales, LakeHuron = LakeHuron, co2 = co2, lynx = lynx
)

describe <- function(fit, h) {
  fc <- forecast(fit, h = h, level = c(80, 95))
  list(
    method = fit$method, components = fit$components,
    par = as.list(fit$par), initstate = num(fit$initstate),
    lik = -2 * fit$loglik, aicc = fit$aicc, sigma2 = fit$sigma2,
    fitted = num(fitted(fit)), residuals = num(residuals(fit)),
    mean = num(fc$mean), lower80 = num(fc$lower[, 1]), upper80 = num(fc$upper[, 1]),
    lower95 = num(fc$lower[, 2]), upper95 = num(fc$upper[, 2])
  )
}

auto <- lapply(names(series), function(nm) {
  y <- series[[nm]]
  m <- frequency(y)
  h <- if (m > 1) 2 * m else 10
  c(list(name = nm, call = "ets(y)", frequency = m, h = h, values = num(y)), describe(ets(y), h))
})

fixedSpecs <- list(
  list(data = "AirPassengers", model = "MAM", damped = TRUE),
  list(data = "AirPassengers", model = "MNM", damped = FALSE),
  list(data = "AirPassengers", model = "AAA", damped = FALSE),
  list(data = "UKgas", model = "MAA", damped = FALSE),
  list(data = "USAccDeaths", model = "AAA", damped = TRUE),
  list(data = "USAccDeaths", model = "ANA", damped = FALSE),
  list(data = "austres", model = "MAN", damped = TRUE),
  list(data = "Nile", model = "ANN", damped = FALSE),
  list(data = "BJsales", model = "AAN", damped = TRUE),
  list(data = "WWWusage", model = "MAN", damped = FALSE),
  list(data = "nottem", model = "ANA", damped = FALSE),
  list(data = "mdeaths", model = "MNA", damped = FALSE)
)
fixed <- lapply(fixedSpecs, function(s) {
  y <- series[[s$data]]
  m <- frequency(y)
  h <- if (m > 1) 2 * m else 10
  fit <- ets(y, model = s$model, damped = s$damped)
  c(list(name = s$data, call = sprintf('ets(y, model = "%s", damped = %s)', s$model, s$damped),
         frequency = m, h = h, values = num(y)), describe(fit, h))
})

# Holt-Winters recursions for given smoothing parameters and start values (stats::HoltWinters).
hwCase <- function(nm, alpha, beta, gamma) {
  y <- series[[nm]]
  f <- frequency(y)
  st <- decompose(ts(y[1:(2 * f)], start = start(y), frequency = f), "additive")
  dat <- na.omit(st$trend)
  cf <- coef(lm(dat ~ seq_along(dat)))
  l.start <- unname(cf[1]); b.start <- unname(cf[2]); s.start <- num(st$figure)
  hw <- HoltWinters(y, alpha = alpha, beta = beta, gamma = gamma, seasonal = "additive",
                    l.start = l.start, b.start = b.start, s.start = s.start)
  list(name = nm, call = sprintf("HoltWinters(y, alpha = %g, beta = %g, gamma = %g, seasonal = 'additive', l.start, b.start, s.start)",
       alpha, beta, gamma), frequency = f, values = num(y), alpha = alpha, beta = beta, gamma = gamma,
       lStart = l.start, bStart = b.start, sStart = s.start, startTime = f + 1,
       SSE = hw$SSE, xhat = num(hw$fitted[, "xhat"]), coefficients = num(hw$coefficients))
}
holtWinters <- list(hwCase("co2", 0.5, 0.05, 0.3), hwCase("USAccDeaths", 0.7, 0.02, 0.2), hwCase("UKgas", 0.3, 0.1, 0.6))

out <- list(
  generator = "test/reference/ets.R",
  R = R.version.string, forecast = as.character(packageVersion("forecast")),
  stats = as.character(packageVersion("stats")),
  note = "lik is -2*loglik as reported by forecast::ets (n*log(SSE) [+ 2*sum(log|yhat|)])",
  auto = auto, fixed = fixed, holtWinters = holtWinters
)
writeLines(toJSON(out, digits = NA, auto_unbox = TRUE, pretty = FALSE), "test/reference/ets.json")
