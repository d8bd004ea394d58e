# Reference fixtures for the benchmark methods, accuracy measures and numeric helpers of the forecasting engine.
# Run by hand from the repository root:  Rscript test/reference/benchmarks.R
# Writes test/reference/benchmarks.json (R's stats and forecast packages on R's built-in datasets).
suppressPackageStartupMessages(library(forecast))
library(jsonlite)
num <- function(x) as.numeric(x)

# Seasonal adjustment as in thetaf: 90% test on the lag-m autocorrelation, classical multiplicative decomposition.
sa <- function(x) {
  m <- frequency(x); n <- length(x)
  seasonal <- FALSE
  if (m > 1) {
    r <- as.numeric(acf(x, lag.max = m, plot = FALSE)$acf)[-1]
    seasonal <- abs(r[m]) / sqrt((1 + 2 * sum(r[-m]^2)) / n) > qnorm(0.95)
  }
  if (!seasonal) return(list(x = x, ahead = function(h) rep(1, h), seasonal = FALSE))
  d <- decompose(x, type = "multiplicative")
  list(x = seasadj(d), ahead = function(h) rep(tail(d$seasonal, m), trunc(1 + h / m))[1:h], seasonal = TRUE)
}
bench <- function(nm, x) {
  m <- frequency(x); h <- if (m > 1) 2 * m else 10
  a <- sa(x); s <- a$ahead(h)
  one <- function(fc) list(mean = num(fc$mean) * s, lower80 = num(fc$lower[, 1]) * s, upper80 = num(fc$upper[, 1]) * s,
                           lower95 = num(fc$lower[, 2]) * s, upper95 = num(fc$upper[, 2]) * s)
  nv <- naive(x, h = h); sn <- snaive(x, h = h)
  list(name = nm, frequency = m, h = h, values = num(x), seasonal = a$seasonal,
       calls = "naive(x, h); snaive(x, h); on thetaf-style adjusted data: naive, ses, holt, holt(damped = TRUE)",
       naive = one(nv) , snaive = list(mean = num(sn$mean), lower80 = num(sn$lower[, 1]), upper80 = num(sn$upper[, 1]),
                                       lower95 = num(sn$lower[, 2]), upper95 = num(sn$upper[, 2])),
       naiveRaw = list(mean = num(nv$mean), lower95 = num(nv$lower[, 2]), upper95 = num(nv$upper[, 2])),
       naive2 = one(naive(a$x, h = h)), ses = one(ses(a$x, h = h)), holt = one(holt(a$x, h = h)),
       damped = one(holt(a$x, h = h, damped = TRUE)))
}
cases <- list(bench("AirPassengers", AirPassengers), bench("UKgas", UKgas), bench("Nile", Nile),
              bench("USAccDeaths", USAccDeaths), bench("austres", austres))
# naive on raw data is only meaningful for the non-seasonal checks; keep the raw naive separately above.

# Accuracy: forecast::accuracy of a seasonal naive forecast of the 1958-1960 AirPassengers values from 1949-1957.
train <- window(AirPassengers, end = c(1957, 12)); test <- window(AirPassengers, start = c(1958, 1))
fc <- snaive(train, h = 36)
acc <- accuracy(fc, test)
smape <- mean(200 * abs(test - fc$mean) / (abs(test) + abs(fc$mean)))

optimCase <- function(name, f, start) {
  o <- optim(start, f, method = "Nelder-Mead")
  list(name = name, start = start, par = num(o$par), value = o$value, counts = unname(o$counts[1]))
}
fr <- function(x) 100 * (x[2] - x[1] * x[1])^2 + (1 - x[1])^2
quad <- function(x) sum((x - c(1, -2, 3))^2 * c(1, 10, 100)) + 0.5
out <- list(
  generator = "test/reference/benchmarks.R", R = R.version.string,
  forecast = as.character(packageVersion("forecast")), stats = as.character(packageVersion("stats")),
  cases = cases,
  accuracy = list(call = "accuracy(snaive(window(AirPassengers, end = c(1957, 12)), h = 36), window(AirPassengers, start = 1958))",
                  train = num(train), test = num(test), forecast = num(fc$mean),
                  ME = acc["Test set", "ME"], RMSE = acc["Test set", "RMSE"], MAE = acc["Test set", "MAE"],
                  MAPE = acc["Test set", "MAPE"], MASE = acc["Test set", "MASE"], sMAPE = smape),
  qnorm = list(p = c(0.5, 0.6, 0.9, 0.95, 0.975, 0.995, 0.9995, 1e-4, 1e-10, 0.2),
               q = qnorm(c(0.5, 0.6, 0.9, 0.95, 0.975, 0.995, 0.9995, 1e-4, 1e-10, 0.2))),
  acf = list(call = "acf(ldeaths, lag.max = 12)", values = num(ldeaths), r = num(acf(ldeaths, lag.max = 12, plot = FALSE)$acf)[-1]),
  optim = list(optimCase("Rosenbrock", fr, c(-1.2, 1)), optimCase("weighted quadratic", quad, c(0, 0, 0))),
  polyroot = list(list(coef = c(0.5, -1.5, 1), inside = max(Mod(polyroot(c(0.5, -1.5, 1)))) <= 1 + 1e-10),
                  list(coef = c(0.06, -0.5, 1), inside = max(Mod(polyroot(c(0.06, -0.5, 1)))) <= 1 + 1e-10),
                  list(coef = c(0.9, 0.2, -0.3, 0.1, 1), inside = max(Mod(polyroot(c(0.9, 0.2, -0.3, 0.1, 1)))) <= 1 + 1e-10),
                  list(coef = c(1.2, 0, 0, 1), inside = max(Mod(polyroot(c(1.2, 0, 0, 1)))) <= 1 + 1e-10),
                  list(coef = c(-0.99, 0.1, 0.5, 1), inside = max(Mod(polyroot(c(-0.99, 0.1, 0.5, 1)))) <= 1 + 1e-10))
)
writeLines(toJSON(out, digits = NA, auto_unbox = TRUE, pretty = FALSE), "test/reference/benchmarks.json")
