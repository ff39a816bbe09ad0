# Ports and addresses shared by the scripts. GUYLINE_PORT_OFFSET shifts every port at once,
# so a second checkout can run its own clusters and servers beside this one.
offset="${GUYLINE_PORT_OFFSET:-0}"
export GUYLINE_APP_PORT=$((3000 + offset))
export GUYLINE_TEST_APP_PORT=$((3100 + offset))
export GUYLINE_PG_DEMO_PORT=$((54329 + offset))
export GUYLINE_PG_TEST_PORT=$((54339 + offset))
export GUYLINE_SMTP_DEMO_PORT=$((2525 + offset))
export GUYLINE_SMTP_TEST_PORT=$((2535 + offset))
export GUYLINE_SMTP_DEMO_INBOX_PORT=$((2526 + offset))
export GUYLINE_SMTP_TEST_INBOX_PORT=$((2536 + offset))
export GUYLINE_SMTP_INTEGRATION_PORT=$((2545 + offset))
