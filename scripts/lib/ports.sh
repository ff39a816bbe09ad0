# Ports shared by the scripts. GUYLINE_PORT_OFFSET (0 to 99) shifts every port at once, so a
# second checkout can run its own clusters and servers beside this one; each kind of port has
# a window of 100, so no two offsets collide.
offset="${GUYLINE_PORT_OFFSET:-0}"
export GUYLINE_APP_PORT=$((3000 + offset))
export GUYLINE_TEST_APP_PORT=$((3100 + offset))
export GUYLINE_PG_DEMO_PORT=$((54329 + offset))
export GUYLINE_PG_TEST_PORT=$((54429 + offset))
export GUYLINE_SMTP_DEMO_PORT=$((2525 + offset))
export GUYLINE_SMTP_TEST_PORT=$((2625 + offset))
export GUYLINE_SMTP_INTEGRATION_PORT=$((2725 + offset))
