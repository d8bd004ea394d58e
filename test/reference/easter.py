# Reference Easter dates for test/time/easter.test.ts.
# Source: python-dateutil's dateutil.easter.easter(year, EASTER_WESTERN) (Debian package python3-dateutil).
# Run by hand from the repository root:  python3 test/reference/easter.py
import json
import dateutil
from dateutil.easter import easter, EASTER_WESTERN

dates = {str(y): easter(y, EASTER_WESTERN).isoformat() for y in range(1583, 2300)}
with open("test/reference/easter.json", "w") as f:
    json.dump({"source": "python-dateutil easter(year, EASTER_WESTERN)", "dateutil": dateutil.__version__,
               "dates": dates}, f, separators=(",", ":"))
