# Reference fixtures for formulas, ratio aggregation and contributions on a public hierarchy.
# Source: R's datasets ldeaths, mdeaths, fdeaths (monthly deaths from lung diseases in the UK, 1974-1979;
# P. J. Diggle (1990), Time Series: A Biostatistical Introduction, Oxford, table A.3), where
# ldeaths = mdeaths + fdeaths exactly. Every figure below is computed here with base R arithmetic, by a second
# route from the one ebbflow takes (ts lags and window sums rather than index loops).
# Run by hand from the repository root:  Rscript test/reference/hierarchy.R
# Writes test/reference/hierarchy.json (R version recorded inside).
library(stats)
library(jsonlite)

stopifnot(all(ldeaths == mdeaths + fdeaths))
# Formula: men's share of the deaths, in percent, a ratio with a division at the top.
share <- 100 * mdeaths / ldeaths
# Year-to-date ratio (calendar fiscal year) for each month: ratio of the summed numerator and denominator.
yr <- floor(time(ldeaths) + 1e-9)
ytdNum <- ave(as.numeric(100 * mdeaths), yr, FUN = cumsum)
ytdDen <- ave(as.numeric(ldeaths), yr, FUN = cumsum)
ytdShare <- ytdNum / ytdDen
# Quarterly figure of the ratio (ratio of the quarter's sums) and its mean of monthly ratios, to show they differ.
q <- aggregate(cbind(m = mdeaths, l = ldeaths), nfrequency = 4, FUN = sum)
quarterShare <- 100 * q[, "m"] / q[, "l"]
# Contributions to year-on-year change, percentage points: 100 * (x_t - x_{t-12}) / X_{t-12}.
base <- stats::lag(ldeaths, -12)
yoyTotal <- 100 * (ldeaths - base) / base
yoyMale <- 100 * (mdeaths - stats::lag(mdeaths, -12)) / base
yoyFemale <- 100 * (fdeaths - stats::lag(fdeaths, -12)) / base
# Contributions to the adjusted month-on-month change, on parts adjusted by stats::stl (indirect total).
adj <- function(x) { f <- stl(x, s.window = "periodic"); as.numeric(x - f$time.series[, "seasonal"]) }
mAdj <- adj(mdeaths); fAdj <- adj(fdeaths)
ind <- mAdj + fAdj
n <- length(ind)
popTotal <- c(NA, 100 * diff(ind) / ind[-n])
popMale <- c(NA, 100 * diff(mAdj) / ind[-n])
popFemale <- c(NA, 100 * diff(fAdj) / ind[-n])

num <- function(x) { x <- as.numeric(x); ifelse(is.na(x), NA, x) }
out <- list(
  generatedBy = "test/reference/hierarchy.R",
  r = R.version.string,
  source = "R datasets ldeaths = mdeaths + fdeaths (Diggle 1990, table A.3), monthly 1974-01 to 1979-12",
  calls = list(
    share = "100 * mdeaths / ldeaths",
    ytdShare = "ave(100 * mdeaths, year, FUN = cumsum) / ave(ldeaths, year, FUN = cumsum)",
    quarterShare = "aggregate(cbind(mdeaths, ldeaths), nfrequency = 4, FUN = sum); 100 * m / l",
    yoy = "100 * (x - lag(x, -12)) / lag(ldeaths, -12)",
    pop = "x - stl(x, s.window = 'periodic')$time.series[, 'seasonal'] for each part; 100 * diff(part) / lag(sum)"
  ),
  start = c(1974, 1),
  mdeaths = num(mdeaths), fdeaths = num(fdeaths), ldeaths = num(ldeaths),
  share = num(share), ytdShare = num(ytdShare), quarterShare = num(quarterShare),
  quarterMeanOfMonthly = num(aggregate(share, nfrequency = 4, FUN = mean)),
  yoy = list(total = c(rep(NA, 12), num(yoyTotal)), male = c(rep(NA, 12), num(yoyMale)),
             female = c(rep(NA, 12), num(yoyFemale))),
  adjusted = list(male = mAdj, female = fAdj),
  pop = list(total = num(popTotal), male = num(popMale), female = num(popFemale))
)
writeLines(toJSON(out, digits = NA, auto_unbox = TRUE, na = "null", pretty = FALSE), "test/reference/hierarchy.json")
