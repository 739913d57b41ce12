#!/usr/bin/env bash
# `npm run db:stop`: stops a PostgreSQL cluster (and the maildev mail fake) left running
# by `npm start` or `npm test`.
source "$(dirname "$0")/lib.sh"
stop_postgres
stop_mail_fake
