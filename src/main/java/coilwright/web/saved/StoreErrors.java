package coilwright.web.saved;

import coilwright.store.DesignNotFoundException;
import coilwright.store.EditForbiddenException;
import coilwright.web.ForbiddenException;
import coilwright.web.NotFoundException;
import io.javalin.http.Handler;

/** Gives the store's refusals their HTTP meaning: an unknown id is a 404, a wrong edit token a 403. */
final class StoreErrors {
    private StoreErrors() {
    }

    static Handler mapped(Handler handler) {
        return ctx -> {
            try {
                handler.handle(ctx);
            } catch (DesignNotFoundException e) {
                throw new NotFoundException(capitalised(e.getMessage()) + ".");
            } catch (EditForbiddenException e) {
                throw new ForbiddenException(capitalised(e.getMessage()) + "; nothing was changed.");
            }
        };
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
