# Reference fixtures for the Theta method (src/analyse/forecast/theta.ts).
# Run by hand from the repository root:  Rscript test/reference/theta.R
# Writes test/reference/theta.json with forecast::thetaf on R's built-in datasets.
suppressPackageStartupMessages(library(forecast))
library(jsonlite)

num <- function(x) as.numeric(x)
series <- list(
  AirPassengers = AirPassengers, UKgas = UKgas, co2 = co2, USAccDeaths = USAccDeaths, nottem = nottem,
  austres = austres, Nile = Nile, WWWusage = WWWusage, JohnsonJohnson = JohnsonJohnson, ldeaths = ldeaths,
  BJsales = BJsales, UKDriverDeaths = UKDriverDeaths
)
cases <- lapply(names(series), function(nm) {
  y <- series[[nm]]
  m <- frequency(y)
  h <- if (m > 1) 2 * m else 10
  fc <- thetaf(y, h = h, level = c(80, 95))
  list(name = nm, call = "thetaf(y, h = h, level = c(80, 95))", frequency = m, h = h, values = num(y),
       alpha = unname(fc$model$alpha), drift = unname(fc$model$drift), sigma2 = unname(fc$model$sigma),
       mean = num(fc$mean), lower80 = num(fc$lower[, 1]), upper80 = num(fc$upper[, 1]),
       lower95 = num(fc$lower[, 2]), upper95 = num(fc$upper[, 2]))
})
out <- list(generator = "test/reference/theta.R", R = R.version.string,
            forecast = as.character(packageVersion("forecast")), stats = as.character(packageVersion("stats")),
            cases = cases)
writeLines(toJSON(out, digits = NA, auto_unbox = TRUE, pretty = FALSE), "test/reference/theta.json")
