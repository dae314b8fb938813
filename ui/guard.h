// The boundary between Qt and our code: an exception from a slot, timer or event handler is
// caught here, logged and shown; the program goes on and the drawing stays as it was.
#pragma once

#include <QApplication>
#include <QMessageBox>
#include <QString>
#include <functional>
#include <type_traits>

class QWidget;

namespace lineward::ui {

/// Runs `fn`; an exception is logged and reported to the user in a message box on `parent`
/// (queued, so it never opens inside a paint or a half-finished event). Returns false where
/// `fn` threw.
bool runGuarded(QWidget* parent, const QString& what, const std::function<void()>& fn);

/// A slot that runs `fn` guarded: `connect(a, &QAction::triggered, w, guarded(w, "Save", ...))`.
/// `fn` takes the signal's arguments, or none.
template <typename Fn> auto guarded(QWidget* parent, QString what, Fn fn) {
    return [parent, what = std::move(what), fn = std::move(fn)](auto&&... args) {
        runGuarded(parent, what, [&] {
            if constexpr (std::is_invocable_v<const Fn&, decltype(args)...>)
                fn(std::forward<decltype(args)>(args)...);
            else
                fn();
        });
    };
}

/// A modal message whose text is shown as plain text (it may quote a file or a tag).
void plainMessage(QWidget* parent, QMessageBox::Icon icon, const QString& title,
                  const QString& text);

/// The desktop program's application object: the last line of the boundary. An exception that
/// escapes an event handler of ours is caught in notify() instead of ending the program.
class Application : public QApplication {
    Q_OBJECT
public:
    Application(int& argc, char** argv);
    bool notify(QObject* receiver, QEvent* event) override;
};

} // namespace lineward::ui
