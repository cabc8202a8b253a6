#!/usr/bin/env bash
# npm run stop: stop the app, the mail worker and the local services that npm start left running.
source "$(dirname "$0")/lib.sh"
services_stop
