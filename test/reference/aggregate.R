# Reference for derive's aggregation: R's datasets::airquality (daily New York air quality, 1 May to 30 September
# 1973; Ozone has missing days) aggregated to months, quarters and ISO weeks by stats::aggregate.
#
#   Rscript test/reference/aggregate.R
#
# Writes test/fixtures/derive/airquality.csv (the daily rows, NA as a blank cell) and test/reference/aggregate.json.
# test/derive/aggregate.test.ts reads both: the CSV through ingest and derive, the JSON as the expected values.
aq <- datasets::airquality
aq$date <- as.Date(sprintf("1973-%02d-%02d", aq$Month, aq$Day))
csv <- data.frame(date = format(aq$date, "%Y-%m-%d"), ozone = aq$Ozone, wind = aq$Wind, temp = aq$Temp)
write.csv(csv, "test/fixtures/derive/airquality.csv", row.names = FALSE, na = "", quote = FALSE)

first <- function(x) { x <- x[!is.na(x)]; if (length(x)) x[1] else NA }
last <- function(x) { x <- x[!is.na(x)]; if (length(x)) x[length(x)] else NA }
funs <- list(
  sum = function(x) sum(x, na.rm = TRUE), mean = function(x) mean(x, na.rm = TRUE),
  min = function(x) min(x, na.rm = TRUE), max = function(x) max(x, na.rm = TRUE),
  first = first, last = last, count = length
)
# One group per period label; every statistic of every column, plus the days with a row (to tell whole periods).
by_period <- function(d, label) {
  groups <- sort(unique(label))
  out <- list(periods = groups, days = as.integer(table(factor(label, levels = groups))))
  for (col in c("ozone", "wind", "temp")) {
    x <- d[[if (col == "ozone") "Ozone" else if (col == "wind") "Wind" else "Temp"]]
    out[[col]] <- lapply(funs, function(f) {
      a <- aggregate(list(v = x), by = list(p = label), FUN = f)
      unname(a$v[match(groups, a$p)])
    })
  }
  out
}
month <- format(aq$date, "%Y-%m")
quarter <- paste0(format(aq$date, "%Y"), "-Q", (as.integer(format(aq$date, "%m")) - 1) %/% 3 + 1)
week <- strftime(aq$date, "%G-W%V")
cut <- aq$date <= as.Date("1973-09-12")
result <- list(
  source = "R datasets::airquality, daily 1973-05-01 to 1973-09-30",
  call = "aggregate(list(v = x), by = list(p = period), FUN = f); f = sum/mean/min/max(na.rm = TRUE), first/last non-missing, length",
  r = R.version.string,
  monthly = by_period(aq, month),
  quarterly = by_period(aq, quarter),
  weekly = by_period(aq, week),
  truncated = list(to = "1973-09-12", monthly = by_period(aq[cut, ], month[cut]), weekly = by_period(aq[cut, ], week[cut]))
)
writeLines((function(x) {
  # A small JSON writer (no jsonlite on a bare Debian R): numbers with 17 significant digits, NA as null.
  to <- function(v) {
    if (is.list(v)) {
      if (!is.null(names(v))) return(paste0("{", paste0('"', names(v), '":', vapply(v, to, ""), collapse = ","), "}"))
      return(paste0("[", paste(vapply(v, to, ""), collapse = ","), "]"))
    }
    if (is.character(v)) { s <- paste0('"', v, '"'); return(if (length(v) == 1) s else paste0("[", paste(s, collapse = ","), "]")) }
    s <- ifelse(is.na(v), "null", trimws(formatC(v, digits = 17, format = "g")))
    paste0("[", paste(s, collapse = ","), "]")
  }
  to(x)
})(result), "test/reference/aggregate.json")
