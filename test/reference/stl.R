# Reference fixtures for the STL and classical decomposition tests.
# Source: R's stats::stl and stats::decompose on R's built-in datasets (package datasets):
# co2, nottem, AirPassengers, UKgas, USAccDeaths, JohnsonJohnson, ldeaths, UKDriverDeaths, austres.
# Run by hand from the repository root:  Rscript test/reference/stl.R
# Writes test/reference/stl.json and test/reference/decompose.json (R version recorded inside).
library(stats)
library(jsonlite)

stlCase <- function(name, x, call, s.window, ...) {
  fit <- stl(x, s.window = s.window, ...)
  ts <- fit$time.series
  list(
    name = name,
    call = call,
    frequency = frequency(x),
    data = as.numeric(x),
    win = as.list(fit$win), deg = as.list(fit$deg), jump = as.list(fit$jump),
    inner = fit$inner, outer = fit$outer,
    periodic = identical(s.window, "periodic"),
    seasonal = as.numeric(ts[, "seasonal"]),
    trend = as.numeric(ts[, "trend"]),
    remainder = as.numeric(ts[, "remainder"]),
    weights = as.numeric(fit$weights)
  )
}

stlCases <- list(
  stlCase("co2-s35", co2, "stl(co2, s.window = 35)", 35),
  stlCase("co2-periodic-robust", co2, "stl(co2, s.window = 'periodic', robust = TRUE)", "periodic", robust = TRUE),
  stlCase("nottem-periodic", nottem, "stl(nottem, s.window = 'periodic')", "periodic"),
  stlCase("logAirPassengers-s13-robust", log(AirPassengers), "stl(log(AirPassengers), s.window = 13, robust = TRUE)", 13,
          robust = TRUE),
  stlCase("logUKgas-s7", log(UKgas), "stl(log(UKgas), s.window = 7)", 7),
  stlCase("UKgas-s11-robust", UKgas, "stl(UKgas, s.window = 11, robust = TRUE)", 11, robust = TRUE),
  stlCase("USAccDeaths-s7-robust", USAccDeaths, "stl(USAccDeaths, s.window = 7, robust = TRUE)", 7, robust = TRUE),
  stlCase("nottem-s9-deg1-jump1", nottem,
          "stl(nottem, s.window = 9, s.degree = 1, t.window = 25, t.degree = 0, s.jump = 1, t.jump = 1, l.jump = 1)", 9,
          s.degree = 1, t.window = 25, t.degree = 0, s.jump = 1, t.jump = 1, l.jump = 1),
  stlCase("USAccDeaths-s9-inner3-outer2", USAccDeaths,
          "stl(USAccDeaths, s.window = 9, t.window = 19, l.window = 15, inner = 3, outer = 2)", 9,
          t.window = 19, l.window = 15, inner = 3, outer = 2),
  stlCase("logJohnsonJohnson-s7-robust", log(JohnsonJohnson), "stl(log(JohnsonJohnson), s.window = 7, robust = TRUE)", 7,
          robust = TRUE),
  stlCase("ldeaths-s13-robust", ldeaths, "stl(ldeaths, s.window = 13, robust = TRUE)", 13, robust = TRUE),
  stlCase("UKDriverDeaths-s21-deg1-robust", UKDriverDeaths,
          "stl(UKDriverDeaths, s.window = 21, s.degree = 1, robust = TRUE)", 21, s.degree = 1, robust = TRUE),
  stlCase("austres-periodic-robust", austres, "stl(austres, s.window = 'periodic', robust = TRUE)", "periodic",
          robust = TRUE)
)

decomposeCase <- function(name, x, type) {
  d <- decompose(x, type = type)
  list(
    name = name,
    call = sprintf("decompose(%s, type = '%s')", name, type),
    frequency = frequency(x),
    type = type,
    data = as.numeric(x),
    trend = as.numeric(d$trend),
    seasonal = as.numeric(d$seasonal),
    random = as.numeric(d$random),
    figure = as.numeric(d$figure)
  )
}

decomposeCases <- list(
  decomposeCase("co2", co2, "additive"),
  decomposeCase("AirPassengers", AirPassengers, "multiplicative"),
  decomposeCase("UKgas", UKgas, "multiplicative"),
  decomposeCase("USAccDeaths", USAccDeaths, "additive")
)

version <- R.version.string
write_json(list(source = "R stats::stl on R datasets", r = version, cases = stlCases),
           "test/reference/stl.json", digits = NA, auto_unbox = TRUE, pretty = FALSE)
write_json(list(source = "R stats::decompose on R datasets", r = version, cases = decomposeCases),
           "test/reference/decompose.json", digits = NA, auto_unbox = TRUE, pretty = FALSE, na = "null")
