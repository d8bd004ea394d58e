# Reference for test/archive/seasonalNaiveMae.test.ts and the tracking scale: in-sample MAE of the
# seasonal naive forecast, mean(abs(diff(x, lag = m))), the MASE denominator of Hyndman & Koehler (2006),
# on R's built-in UKgas (quarterly, m = 4) and AirPassengers (monthly, m = 12).
# Run by hand from this folder:  Rscript seasonal-naive-mae.R > seasonal-naive-mae.json
library(jsonlite)
one <- function(x, m) list(values = as.numeric(x), lag = m, mae = mean(abs(diff(as.numeric(x), lag = m))),
                           call = sprintf("mean(abs(diff(as.numeric(x), lag = %d)))", m))
out <- list(
  r_version = R.version.string,
  jsonlite_version = as.character(packageVersion("jsonlite")),
  UKgas = one(UKgas, 4),
  AirPassengers = one(AirPassengers, 12)
)
cat(toJSON(out, auto_unbox = TRUE, digits = NA, pretty = TRUE), "\n")
